import { describe, expect, it } from 'vitest';
import { apiClient, sessionCookie, testApp } from '../../support/api-client';
import { createUser, uniqueEmail } from '../../support/factories';
import { waitForMail } from '../../support/mailbox';
import request from 'supertest';

describe('sign-up', () => {
  it('rejects bad input with a 400 that names each field', async () => {
    const client = await apiClient();
    const res = await client.post('/api/users', { email: 'not-an-email', name: '', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password']);
    expect(res.body.error.fields.password).toMatch(/at least 10/);
  });

  it('makes an account that signs in with its password, its address not yet confirmed', async () => {
    const email = uniqueEmail('signup');
    const client = await apiClient();
    const res = await client.post('/api/users', { email: email.toUpperCase(), name: 'Ria Dunmore', password: 'long enough password' });
    expect(res.status).toBe(202);
    expect((await client.get('/api/session')).body.user).toBeNull(); // sign-up signs nobody in
    await waitForMail(email); // the account exists once its confirmation mail is queued
    const signedIn = await client.signIn(email, 'long enough password');
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.user).toMatchObject({ email, name: 'Ria Dunmore', isSiteAdmin: false, mayOrganise: false, emailVerified: false });
    expect(signedIn.body.user).not.toHaveProperty('passwordHash');
  });
});

describe('sign-in and sign-out', () => {
  it('signs in with the right password and regenerates the session id', async () => {
    const { email, password } = await createUser();
    const client = await apiClient();
    const before = sessionCookie(await client.refresh());
    const res = await client.signIn(email, password);
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(email);
    const after = sessionCookie(res);
    expect(before).toBeDefined();
    expect(after).toBeDefined();
    expect(after).not.toBe(before);
    // The pre-sign-in id is worthless now: it carries no user.
    const old = await request(testApp()).get('/api/session').set('Cookie', before!);
    expect(old.body.user).toBeNull();
    // The new CSRF token belongs to the new session and works.
    expect((await client.patch('/api/account', { name: 'Renamed' })).status).toBe(200);
  });

  it('refuses a wrong password and an unknown e-mail alike with 401', async () => {
    const { email } = await createUser();
    const client = await apiClient();
    const wrong = await client.signIn(email, 'not the password');
    const unknown = await client.signIn(uniqueEmail('nobody'), 'not the password');
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('UNAUTHENTICATED');
    }
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect((await client.get('/api/session')).body.user).toBeNull();
  });

  it('signs out by destroying the session', async () => {
    const { email, password } = await createUser();
    const client = await apiClient();
    const signedIn = sessionCookie(await client.signIn(email, password))!;
    const res = await client.delete('/api/session');
    expect(res.status).toBe(204);
    expect((await client.get('/api/session')).body.user).toBeNull();
    const replay = await request(testApp()).get('/api/session').set('Cookie', signedIn);
    expect(replay.body.user).toBeNull();
  });

  it('rate-limits sign-in attempts per e-mail (SIGNIN_RATE_LIMIT is 5 in tests)', async () => {
    const { email, password } = await createUser();
    const client = await apiClient();
    for (let i = 0; i < 5; i++) expect((await client.signIn(email, 'guess ' + i)).status).toBe(401);
    const limited = await client.signIn(email, password);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('RATE_LIMITED');
    // Another account from the same address is not locked out by it.
    const other = await createUser();
    expect((await client.signIn(other.email, other.password)).status).toBe(200);
  });
});

describe('CSRF', () => {
  it('rejects a write without the token, or with a wrong one, and accepts the right one', async () => {
    const { email, password } = await createUser();
    const client = await apiClient();
    const missing = await client.raw.post('/api/session').send({ email, password });
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('CSRF_INVALID');
    const wrong = await client.raw.post('/api/session').set('X-CSRF-Token', 'f'.repeat(64)).send({ email, password });
    expect(wrong.status).toBe(403);
    expect((await client.signIn(email, password)).status).toBe(200);
    const noToken = await client.raw.patch('/api/account').send({ name: 'Sneaky' });
    expect(noToken.status).toBe(403);
  });
});

describe('account', () => {
  it('needs a signed-in person', async () => {
    const client = await apiClient();
    const res = await client.patch('/api/account', { name: 'Anyone' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });

  it('changes the password after checking the current one, and signs other sessions out', async () => {
    const { email, password } = await createUser();
    const here = await apiClient();
    const elsewhere = await apiClient();
    await here.signIn(email, password);
    await elsewhere.signIn(email, password);

    const bad = await here.post('/api/account/password', { currentPassword: 'wrong one', newPassword: 'a brand new password' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.currentPassword).toBeDefined();

    const ok = await here.post('/api/account/password', { currentPassword: password, newPassword: 'a brand new password' });
    expect(ok.status).toBe(204);
    expect((await here.get('/api/session')).body.user.email).toBe(email);
    expect((await elsewhere.get('/api/session')).body.user).toBeNull();
    const fresh = await apiClient();
    expect((await fresh.signIn(email, password)).status).toBe(401);
    expect((await fresh.signIn(email, 'a brand new password')).status).toBe(200);
  });
});
