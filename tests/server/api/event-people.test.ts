import { describe, expect, it } from 'vitest';
import { EventInvitation } from '@server/models/event-invitation';
import { EmailVerificationToken } from '@server/models/email-verification-token';
import { User } from '@server/models/user';
import { apiClient } from '../../support/api-client';
import { ownerWithBuild, showWithClasses, signedIn } from '../../support/event-factory';
import { waitForMail, waitForMailAbout } from '../../support/mailbox';
import { createUser, uniqueEmail } from '../../support/factories';

const linkToken = (text: string) => /\/invitations\/([A-Za-z0-9_-]+)/.exec(text)![1]!;

describe('people of a show: invitations', () => {
  it('mails a single-use link that gives the role to the invited account when it accepts, signed in', async () => {
    const { organiser, eventId } = await showWithClasses({ settings: { name: 'Lakeside <Show>' } });
    const judge = await signedIn({ name: 'Jay Judge' });
    const res = await organiser.client.post(`/api/events/${eventId}/invitations`, { email: judge.email.toUpperCase(), role: 'judge' });
    expect(res.status).toBe(201);
    expect(res.body.invitation).toMatchObject({ email: judge.email, role: 'judge', invitedBy: 'Org Anizer' });
    const mail = await waitForMail(judge.email);
    expect(mail.subject).toMatch(/invited to Lakeside <Show> as judge/);
    expect(mail.html).toContain('Lakeside &lt;Show&gt;');
    expect(mail.html).not.toContain('<Show>');
    const token = linkToken(mail.text);
    expect(await EventInvitation.count({ where: { tokenHash: token } })).toBe(0); // only the hash is kept

    const anonymous = await apiClient();
    const preview = await anonymous.get(`/api/invitations/${token}`);
    expect(preview.body.invitation).toMatchObject({ eventName: 'Lakeside <Show>', role: 'judge', state: 'open' });
    expect((await anonymous.post(`/api/invitations/${token}/accept`)).status).toBe(401);

    const accepted = await judge.client.post(`/api/invitations/${token}/accept`);
    expect(accepted.body).toEqual({ eventId, role: 'judge' });
    const detail = await judge.client.get(`/api/events/${eventId}`);
    expect(detail.body.event.myRoles).toEqual(['judge']);
    expect(detail.body.event.abilities).toMatchObject({ manage: false, viewEntries: false, checkIn: false });
    expect((await judge.client.get('/api/events')).body.events.map((e: { id: number }) => e.id)).toEqual([eventId]);

    const again = await judge.client.post(`/api/invitations/${token}/accept`);
    expect(again.status).toBe(400);
    expect(again.body.error.fields.token).toMatch(/already used/);
    const someoneElse = await signedIn();
    expect((await someoneElse.client.post(`/api/invitations/${token}/accept`)).body.error.fields.token).toMatch(/already used/);
    expect((await anonymous.get(`/api/invitations/${token}`)).body.invitation.state).toBe('used');
  });

  it('lets an invitee with no account create one and then accept; refuses expired and withdrawn links', async () => {
    const { organiser, eventId } = await showWithClasses();
    const email = uniqueEmail('gate');
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email, role: 'gate' });
    const token = linkToken((await waitForMail(email)).text);
    const newcomer = await apiClient();
    expect((await newcomer.post('/api/users', { email, name: 'Gale Gatekeeper', password: 'a long enough password' })).status).toBe(202);
    // A new account confirms its address before it takes a role: follow the confirmation mail, then sign in.
    const confirmation = await waitForMailAbout(email, /Confirm your e-mail/);
    const verifyToken = /verify-email\?token=([A-Za-z0-9_-]+)/.exec(confirmation.text)?.[1];
    expect((await newcomer.post('/api/email-verifications/confirm', { token: verifyToken })).status).toBeLessThan(300);
    expect((await newcomer.signIn(email, 'a long enough password')).status).toBe(200);
    expect((await newcomer.post(`/api/invitations/${token}/accept`)).body.role).toBe('gate');

    const email2 = uniqueEmail('late');
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email: email2, role: 'judge' });
    const late = linkToken((await waitForMail(email2)).text);
    await EventInvitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: email2 } });
    const someone = await signedIn();
    expect((await someone.client.post(`/api/invitations/${late}/accept`)).body.error.fields.token).toMatch(/expired/);

    const email3 = uniqueEmail('revoked');
    const inv = (await organiser.client.post(`/api/events/${eventId}/invitations`, { email: email3, role: 'judge' })).body.invitation;
    const revokedToken = linkToken((await waitForMail(email3)).text);
    expect((await organiser.client.delete(`/api/events/${eventId}/invitations/${inv.id}`)).status).toBe(204);
    expect((await someone.client.post(`/api/invitations/${revokedToken}/accept`)).body.error.fields.token).toMatch(/withdrawn/);
    expect((await someone.client.get('/api/invitations/not-a-token')).status).toBe(400);
    expect((await someone.client.get(`/api/invitations/${'x'.repeat(43)}`)).status).toBe(404);

    const people = await organiser.client.get(`/api/events/${eventId}/people`);
    expect(people.body.members.map((m: { name: string; role: string }) => [m.name, m.role]).sort()).toEqual([['Gale Gatekeeper', 'gate'], ['Org Anizer', 'organiser']]);
    expect(people.body.invitations.map((i: { email: string }) => i.email)).toEqual([]);
    expect((await organiser.client.post(`/api/events/${eventId}/invitations`, { email: 'not-an-email', role: 'boss' })).body.error.fields).toMatchObject({ email: expect.any(String), role: expect.any(String) });
  });

  it('removes a member; the last organiser cannot leave, a second one can', async () => {
    const { organiser, eventId } = await showWithClasses();
    const leave = await organiser.client.delete(`/api/events/${eventId}/members/${organiser.user.id}/organiser`);
    expect(leave.status).toBe(409);
    expect(leave.body.error.message).toMatch(/at least one organiser/);

    const co = await signedIn({ name: 'Co Organiser' });
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email: co.email, role: 'organiser' });
    await co.client.post(`/api/invitations/${linkToken((await waitForMail(co.email)).text)}/accept`);
    expect((await co.client.get(`/api/events/${eventId}/people`)).status).toBe(200);
    expect((await organiser.client.delete(`/api/events/${eventId}/members/${organiser.user.id}/organiser`)).status).toBe(204);
    expect((await organiser.client.get(`/api/events/${eventId}`)).status).toBe(404);
    expect((await co.client.delete(`/api/events/${eventId}/members/${co.user.id}/organiser`)).status).toBe(409);
  });
});

describe('gate and judge roles do only their thing', () => {
  it('a gate account checks in on show day and nothing else; a judge cannot check in, manage or see entries', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ settings: { entryFee: 0 } });
    const gate = await signedIn({ name: 'Gate Keeper' });
    const judge = await signedIn({ name: 'Judge Dredd-Free' });
    for (const [person, role] of [[gate, 'gate'], [judge, 'judge']] as const) {
      await organiser.client.post(`/api/events/${eventId}/invitations`, { email: person.email, role });
      await person.client.post(`/api/invitations/${linkToken((await waitForMail(person.email)).text)}/accept`);
    }
    const owner = await ownerWithBuild();
    const unpaidOwner = await ownerWithBuild();
    const entry = (await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).body.entry;
    expect(entry.status).toBe('confirmed');
    void unpaidOwner;

    for (const who of [gate, judge]) {
      expect((await who.client.get(`/api/events/${eventId}`)).status).toBe(200);
      expect((await who.client.patch(`/api/events/${eventId}`, { name: 'Taken over' })).status).toBe(403);
      expect((await who.client.get(`/api/events/${eventId}/entries`)).status).toBe(403);
      expect((await who.client.get(`/api/events/${eventId}/people`)).status).toBe(403);
      expect((await who.client.post(`/api/events/${eventId}/classes`, { name: 'Extra' })).status).toBe(403);
      expect((await who.client.put(`/api/events/${eventId}/criteria`, { criteria: [] })).status).toBe(403);
      expect((await who.client.post(`/api/events/${eventId}/lifecycle`, { action: 'close_registration' })).status).toBe(403);
      expect((await who.client.post(`/api/entries/${entry.id}/withdraw`)).status).toBe(403);
    }
    // Before show day, nobody checks in.
    expect((await gate.client.post(`/api/events/${eventId}/gate/check-in`, { number: 1 })).status).toBe(403);
    await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action: 'close_registration' });
    await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action: 'open_gate' });
    expect((await judge.client.post(`/api/events/${eventId}/gate/check-in`, { number: 1 })).status).toBe(403);
    const checked = await gate.client.post(`/api/events/${eventId}/gate/check-in`, { number: 1 });
    expect(checked.body.card.entry).toMatchObject({ number: 1, status: 'checked_in' });
    expect((await gate.client.post(`/api/events/${eventId}/gate/check-in`, { number: 1 })).body.error.message).toMatch(/already checked in/);
    expect((await gate.client.post(`/api/events/${eventId}/gate/check-in`, { number: 99 })).status).toBe(404);
    expect((await gate.client.get(`/api/events/${eventId}`)).body.event.abilities).toMatchObject({ checkIn: true, manage: false, judge: false });
  });
});

describe('an invitation belongs to the address it was sent to', () => {
  it('refuses a forwarded link to another confirmed account, which gains no role, and lets the invited address accept', async () => {
    const { organiser, eventId } = await showWithClasses({ settings: { name: 'Forwarded Link Show' } });
    const invitedEmail = uniqueEmail('invited');
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email: invitedEmail, role: 'organiser' });
    const token = linkToken((await waitForMail(invitedEmail)).text);

    const forwardedTo = await signedIn({ name: 'Not The Invitee' });
    const refused = await forwardedTo.client.post(`/api/invitations/${token}/accept`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/sent to a different e-mail address/);
    expect(refused.body.error.message).toMatch(/ask the organiser to invite/);
    expect(JSON.stringify(refused.body)).not.toContain(invitedEmail);
    expect((await forwardedTo.client.get(`/api/events/${eventId}`)).status).toBe(404);
    expect((await forwardedTo.client.get(`/api/events/${eventId}/people`)).status).toBe(404);
    expect((await forwardedTo.client.get(`/api/events/${eventId}/entries`)).status).toBe(404);
    expect((await forwardedTo.client.get(`/api/invitations/${token}`)).body.invitation.state).toBe('open');

    const { email, password } = await createUser({ email: invitedEmail, name: 'The Invitee' });
    const invitee = await apiClient();
    expect((await invitee.signIn(email, password)).status).toBe(200);
    const accepted = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ eventId, role: 'organiser' });
    expect((await invitee.get(`/api/events/${eventId}/people`)).status).toBe(200);
    expect((await forwardedTo.client.get(`/api/events/${eventId}`)).status).toBe(404);
  });

  it('refuses the invited address while it is unconfirmed, with the confirmation message', async () => {
    const { organiser, eventId } = await showWithClasses();
    const { email, password } = await createUser({ emailVerified: false });
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email, role: 'judge' });
    const token = linkToken((await waitForMail(email)).text);
    const client = await apiClient();
    await client.signIn(email, password);
    const refused = await client.post(`/api/invitations/${token}/accept`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/Confirm your e-mail/);
  });

  it('confirms a new account made from the link with the invited address and signs it in, ready to accept at once', async () => {
    const { organiser, eventId } = await showWithClasses();
    const email = uniqueEmail('newcomer');
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email, role: 'judge' });
    const token = linkToken((await waitForMail(email)).text);

    const newcomer = await apiClient();
    const made = await newcomer.post('/api/users', { email: email.toUpperCase(), name: 'New Judge', password: 'a long enough password', invitationToken: token });
    expect(made.status).toBe(201);
    expect(made.body.session.user).toMatchObject({ name: 'New Judge' });
    const user = await User.findOne({ where: { email } });
    expect(user?.emailVerifiedAt).toBeInstanceOf(Date);
    expect(await EmailVerificationToken.count({ where: { userId: user!.id } })).toBe(0); // no second mail to confirm
    const accepted = await newcomer.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ eventId, role: 'judge' });
  });

  it('makes an ordinary unconfirmed account when the link is used to sign up with another address', async () => {
    const { organiser, eventId } = await showWithClasses();
    const invited = uniqueEmail('invited');
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email: invited, role: 'organiser' });
    const token = linkToken((await waitForMail(invited)).text);

    const other = uniqueEmail('other');
    const stranger = await apiClient();
    const made = await stranger.post('/api/users', { email: other, name: 'Link Holder', password: 'a long enough password', invitationToken: token });
    expect(made.status).toBe(202);
    expect(made.body.session).toBeNull();
    await waitForMailAbout(other, /Confirm your e-mail/);
    expect((await User.findOne({ where: { email: other } }))?.emailVerifiedAt).toBeNull();
    expect((await stranger.signIn(other, 'a long enough password')).status).toBe(200);
    expect((await stranger.post(`/api/invitations/${token}/accept`)).status).toBe(403);

    const badToken = await stranger.post('/api/users', { email: uniqueEmail(), name: 'X', password: 'a long enough password', invitationToken: 'short' });
    expect(badToken.status).toBe(400);
    expect(badToken.body.error.fields.invitationToken).toBeDefined();
  });
});
