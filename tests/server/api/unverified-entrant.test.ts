import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';
import { showWithClasses } from '../../support/event-factory';
import { waitForMail } from '../../support/mailbox';

describe('an account whose e-mail is not confirmed', () => {
  it('can build and publish, but cannot enter a show or take a role until it confirms', async () => {
    const { organiser, eventId, classIds } = await showWithClasses();
    const { user, email, password } = await createUser({ emailVerified: false, name: 'Unconfirmed Entrant' });
    const client = await apiClient();
    expect((await client.signIn(email, password)).status).toBe(200);
    const build = await createBuild(user.id, { title: 'Plum pickup', published: true });

    const refused = await client.post(`/api/events/${eventId}/entries`, { buildId: build.id, classId: classIds[0] });
    expect(refused.status).toBe(403);
    expect((await organiser.client.get(`/api/events/${eventId}/entries`)).body.entries ?? []).not.toContainEqual(expect.objectContaining({ buildId: build.id }));

    const invite = await organiser.client.post(`/api/events/${eventId}/invitations`, { email, role: 'judge' });
    expect(invite.status).toBe(201);
    const mail = await waitForMail(email);
    const token = /\/invitations\/([A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    expect(token).toBeTruthy();
    const accepted = await client.post(`/api/invitations/${token}/accept`, {});
    expect(accepted.status).toBe(403);
    expect(accepted.body.error.message).toMatch(/Confirm your e-mail/);

    await user.update({ emailVerifiedAt: new Date() });
    const entered = await client.post(`/api/events/${eventId}/entries`, { buildId: build.id, classId: classIds[0] });
    expect(entered.status).toBe(201);
  });
});
