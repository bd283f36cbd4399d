import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// The suite's environment lifts these per-address limits (every supertest request comes from 127.0.0.1);
// this file's server keeps the defaults and talks from loopback addresses of its own.
delete process.env.PASSWORD_RESET_ADDRESS_RATE_LIMIT_PER_HOUR;
delete process.env.INVITATION_RATE_LIMIT;
const { config } = await import('@server/config');
const { closeConnections } = await import('@server/index');
const { listenApp } = await import('../../support/raw-http');
const { addressClient } = await import('../../support/address-client');
const { createUser, uniqueEmail } = await import('../../support/factories');
const { showWithClasses } = await import('../../support/event-factory');
const { waitForMail } = await import('../../support/mailbox');

let server: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => {
  server = await listenApp();
});
afterAll(async () => {
  await server.close();
  await closeConnections();
});

describe('password-reset requests per address', () => {
  it('refuses a network asking for many different e-mails past the limit, while another address still asks', async () => {
    expect(config.passwordResetAddressRateLimitPerHour).toBe(20);
    const prober = addressClient(server.baseUrl);
    await prober.start();
    for (let i = 0; i < 20; i++) expect((await prober.post('/api/password-resets', { email: uniqueEmail(`probe${i}`) })).status).toBe(202);
    const limited = await prober.post('/api/password-resets', { email: uniqueEmail('probe-last') });
    expect(limited.status).toBe(429);
    expect(limited.body.error?.message).toMatch(/Too many reset requests from this network/);

    // Per address: the same person's reset asked from another address goes through.
    const { email } = await createUser();
    expect((await prober.post('/api/password-resets', { email })).status).toBe(429);
    const elsewhere = addressClient(server.baseUrl);
    await elsewhere.start();
    expect((await elsewhere.post('/api/password-resets', { email })).status).toBe(202);
    const mail = await waitForMail(email);
    expect(mail.subject).toBe('Reset your Placard password');
  });
});

describe('invitation links per address', () => {
  it('limits previews and acceptances per address, refused ones included', async () => {
    expect(config.invitationRateLimit).toBe(30);
    const { organiser, eventId } = await showWithClasses();
    const { email, password } = await createUser();
    await organiser.client.post(`/api/events/${eventId}/invitations`, { email, role: 'judge' });
    const token = /\/invitations\/([A-Za-z0-9_-]+)/.exec((await waitForMail(email)).text)![1]!;

    const guesser = addressClient(server.baseUrl);
    await guesser.start();
    for (let i = 0; i < 30; i++) expect((await guesser.get(`/api/invitations/${'g'.repeat(30)}${i}`)).status).toBe(404);
    const preview = await guesser.get(`/api/invitations/${token}`);
    expect(preview.status).toBe(429);
    expect(preview.body.error?.message).toMatch(/Too many invitation links/);

    const invitee = addressClient(server.baseUrl);
    await invitee.start();
    expect((await invitee.get(`/api/invitations/${token}`)).status).toBe(200);
    expect((await invitee.signIn(email, password)).status).toBe(200);
    for (let i = 0; i < 30; i++) expect((await invitee.post(`/api/invitations/${'g'.repeat(30)}${i}/accept`)).status).toBe(404);
    const accept = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accept.status).toBe(429);
    expect(accept.body.error?.message).toMatch(/Too many attempts to accept/);

    // The same account from another address accepts: the limit is per address, and the refused attempt took nothing.
    const again = addressClient(server.baseUrl);
    await again.start();
    expect((await again.signIn(email, password)).status).toBe(200);
    expect((await again.post(`/api/invitations/${token}/accept`)).body).toEqual({ eventId, role: 'judge' });
  });
});
