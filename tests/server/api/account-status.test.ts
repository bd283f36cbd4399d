import { describe, expect, it } from 'vitest';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';
import request from 'supertest';
import { AdminUserDetailSchema, AdminUserSchema } from '@shared/schemas/user';
import { apiClient, testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';
import { countMail, waitForMail } from '../../support/mailbox';
import { PasswordResetToken } from '@server/models/password-reset-token';

async function signedIn(flags: { isSiteAdmin?: boolean } = {}) {
  const made = await createUser({ ...flags, name: flags.isSiteAdmin ? 'An Admin' : 'An Owner' });
  const client = await apiClient();
  expect((await client.signIn(made.email, made.password)).status).toBe(200);
  return { client, ...made };
}

describe('disabling an account (site admin)', () => {
  // Each server process trusts a cached page for up to a second; here every request checks the version.
  checkPageVersionOnEveryRequest();

  it('stops its sign-in, ends its sessions, takes its public pages offline, and re-enabling brings all back', async () => {
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const owner = await signedIn();
    const build = await createBuild(owner.user.id, { title: 'Slate-grey sedan delivery', published: true });
    expect((await request(testApp()).get(`/c/${build.code}`)).status).toBe(200);

    const res = await admin.put(`/api/admin/users/${owner.user.id}/disabled`, { disabled: true });
    expect(res.status).toBe(200);
    expect(AdminUserSchema.parse(res.body.user).disabledAt).not.toBeNull();

    // The open session is over, a new sign-in is refused, the public page is gone.
    expect((await owner.client.get('/api/session')).body.user).toBeNull();
    expect((await owner.client.get('/api/builds')).status).toBe(401);
    const again = await (await apiClient()).signIn(owner.email, owner.password);
    expect(again.status).toBe(403);
    expect(again.body.error.message).toBe('This account is turned off. Ask the site admin.');
    expect((await request(testApp()).get(`/c/${build.code}`)).status).toBe(404);
    expect((await request(testApp()).get(`/api/public/builds/${build.code}`)).status).toBe(404);
    // Asking for a reset answers as always, but makes no link for a turned-off account.
    expect((await (await apiClient()).post('/api/password-resets', { email: owner.email })).status).toBe(202);
    // The request answers before its work: a second one, for an account that does get a link, is done after it.
    const marker = await createUser();
    await (await apiClient()).post('/api/password-resets', { email: marker.email });
    await waitForMail(marker.email);
    expect(await PasswordResetToken.count({ where: { userId: owner.user.id } })).toBe(0);
    const tiles = await request(testApp()).get('/api/public/builds?limit=24');
    expect(tiles.body.builds.map((b: { code: string }) => b.code)).not.toContain(build.code);

    expect((await admin.put(`/api/admin/users/${owner.user.id}/disabled`, { disabled: false })).body.user.disabledAt).toBeNull();
    expect((await (await apiClient()).signIn(owner.email, owner.password)).status).toBe(200);
    expect((await request(testApp()).get(`/c/${build.code}`)).status).toBe(200);
  });

  it('refuses disabling oneself, non-admins, bad bodies and unknown accounts', async () => {
    const { client: admin, user: me } = await signedIn({ isSiteAdmin: true });
    const self = await admin.put(`/api/admin/users/${me.id}/disabled`, { disabled: true });
    expect(self.status).toBe(403);
    expect((await admin.get('/api/session')).body.user.id).toBe(me.id);

    const other = await createUser();
    const { client: owner } = await signedIn();
    expect((await owner.put(`/api/admin/users/${other.user.id}/disabled`, { disabled: true })).status).toBe(403);
    expect((await (await apiClient()).put(`/api/admin/users/${other.user.id}/disabled`, { disabled: true })).status).toBe(401);

    const bad = await admin.put(`/api/admin/users/${other.user.id}/disabled`, { disabled: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.disabled).toMatch(/true or false/);
    expect((await admin.put('/api/admin/users/2147483000/disabled', { disabled: true })).status).toBe(404);
  });

  it('disables and re-enables another site admin (the acting admin always remains, so one can always sign in)', async () => {
    const a = await signedIn({ isSiteAdmin: true });
    const b = await signedIn({ isSiteAdmin: true });
    expect((await a.client.put(`/api/admin/users/${b.user.id}/disabled`, { disabled: true })).status).toBe(200);
    expect((await b.client.get('/api/session')).body.user).toBeNull();
    expect((await a.client.put(`/api/admin/users/${b.user.id}/disabled`, { disabled: false })).status).toBe(200);
    expect((await (await apiClient()).signIn(b.email, b.password)).status).toBe(200);
  });
});

describe('signing in to a turned-off account', () => {
  it('tells the person who knows the password that the account is off; a wrong password hears only the usual answer', async () => {
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const owner = await createUser({ name: 'Wenna Pellock' });
    expect((await admin.put(`/api/admin/users/${owner.user.id}/disabled`, { disabled: true })).status).toBe(200);

    const right = await (await apiClient()).signIn(owner.email, owner.password);
    expect(right.status).toBe(403);
    expect(right.body.error.message).toBe('This account is turned off. Ask the site admin.');
    expect(right.body.error.fields).toBeUndefined();

    const wrong = await (await apiClient()).signIn(owner.email, `${owner.password}x`);
    const nobody = await (await apiClient()).signIn('nobody-here@placard.test', owner.password);
    for (const res of [wrong, nobody]) {
      expect(res.status).toBe(401);
      expect(res.body.error.fields.password).toBe('E-mail or password is not right.');
      expect(res.body.error.message).not.toMatch(/turned off/);
    }
    // The refused sign-in made no session.
    const session = await (await apiClient()).get('/api/session');
    expect(session.body.user).toBeNull();
  });
});

describe('an account opened by the site admin', () => {
  it('shows its builds, last sign-in and status, and sends it a password-reset e-mail', async () => {
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const owner = await signedIn();
    await createBuild(owner.user.id, { title: 'Copper roadster', published: true });
    await createBuild(owner.user.id, { title: 'Unfinished wagon', published: false });

    const res = await admin.get(`/api/admin/users/${owner.user.id}`);
    expect(res.status).toBe(200);
    const detail = AdminUserDetailSchema.parse(res.body);
    expect(detail.builds.map((b) => b.title).sort()).toEqual(['Copper roadster', 'Unfinished wagon']);
    expect(Date.now() - Date.parse(detail.user.lastSignInAt!)).toBeLessThan(60_000);
    expect(detail.user).not.toHaveProperty('passwordHash');

    const sent = await admin.post(`/api/admin/users/${owner.user.id}/password-reset`, {});
    expect(sent.status).toBe(202);
    const mail = await waitForMail(owner.email);
    expect(mail.text).toMatch(/reset-password\?token=/);
    // The mail says who sent it, not "someone (hopefully you) asked".
    expect(mail.text).toMatch(/The site admin of Placard sent you this link/);
    expect(mail.text).not.toMatch(/hopefully you/);

    const { client: someone } = await signedIn();
    expect((await someone.get(`/api/admin/users/${owner.user.id}`)).status).toBe(403);
    expect((await someone.post(`/api/admin/users/${owner.user.id}/password-reset`, {})).status).toBe(403);
  });
});

describe('a reset link for a turned-off account', () => {
  it('is refused with a reason, and no link is made or mailed', async () => {
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const owner = await createUser({ name: 'Tamsin Orrery' });
    expect((await admin.put(`/api/admin/users/${owner.user.id}/disabled`, { disabled: true })).status).toBe(200);

    const res = await admin.post(`/api/admin/users/${owner.user.id}/password-reset`, {});
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe('This account is turned off, so no reset link was sent. Enable the account first.');
    expect(await PasswordResetToken.count({ where: { userId: owner.user.id } })).toBe(0);
    expect(await countMail(owner.email)).toBe(0);

    // Enabled again, the same button works.
    expect((await admin.put(`/api/admin/users/${owner.user.id}/disabled`, { disabled: false })).status).toBe(200);
    expect((await admin.post(`/api/admin/users/${owner.user.id}/password-reset`, {})).status).toBe(202);
    expect((await waitForMail(owner.email)).text).toMatch(/The site admin of Placard sent you this link/);
  });
});

describe('the sign-in limit', () => {
  it('counts failures only: ten good sign-ins in a row are never locked out (the limit is 5 in tests)', async () => {
    const { email, password } = await createUser();
    for (let i = 0; i < 10; i++) expect((await (await apiClient()).signIn(email, password)).status).toBe(200);
  });

  it('forgets earlier failures after a good sign-in, and still stops the sixth failure in a row', async () => {
    const { email, password } = await createUser();
    const client = await apiClient();
    for (let i = 0; i < 4; i++) expect((await client.signIn(email, `wrong ${i}`)).status).toBe(401);
    expect((await client.signIn(email, password)).status).toBe(200);
    const next = await apiClient();
    for (let i = 0; i < 5; i++) expect((await next.signIn(email, `wrong again ${i}`)).status).toBe(401);
    expect((await next.signIn(email, password)).status).toBe(429);
  });
});
