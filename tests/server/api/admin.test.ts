import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';

async function signedIn(flags: { isSiteAdmin?: boolean; mayOrganise?: boolean } = {}) {
  const { user, email, password } = await createUser({ ...flags, name: flags.isSiteAdmin ? 'An Admin' : 'An Owner' });
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { client, user };
}

describe('accounts (site admin)', () => {
  it('lists accounts for the site admin only', async () => {
    const anonymous = await apiClient();
    expect((await anonymous.get('/api/admin/users')).status).toBe(401);
    const { client: owner } = await signedIn();
    const refused = await owner.get('/api/admin/users');
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const res = await admin.get('/api/admin/users?pageSize=5');
    expect(res.status).toBe(200);
    expect(res.body.users.length).toBeLessThanOrEqual(5);
    expect(res.body.total).toBeGreaterThan(0);
    expect(res.body.users[0]).not.toHaveProperty('passwordHash');
  });

  it('finds accounts by name or e-mail and validates the query', async () => {
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const target = await createUser({ name: 'Wilhelmina Quarrie' });
    const res = await admin.get('/api/admin/users?q=quarrie');
    expect(res.body.users.map((u: { id: number }) => u.id)).toContain(target.user.id);
    const bad = await admin.get('/api/admin/users?page=0&pageSize=1000');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['page', 'pageSize']);
  });

  it('grants may-organise, which the person sees at once as an ability', async () => {
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const { client: owner, user } = await signedIn();
    expect((await owner.get('/api/session')).body.user.abilities.createEvents).toBe(false);
    const res = await admin.patch(`/api/admin/users/${user.id}`, { mayOrganise: true });
    expect(res.status).toBe(200);
    expect(res.body.user.mayOrganise).toBe(true);
    expect((await owner.get('/api/session')).body.user.abilities.createEvents).toBe(true);
  });

  it('refuses role changes from a non-admin, bad bodies, unknown ids, and removing your own admin role', async () => {
    const { client: owner, user: ownerUser } = await signedIn();
    expect((await owner.patch(`/api/admin/users/${ownerUser.id}`, { isSiteAdmin: true })).status).toBe(403);
    const { client: admin, user: adminUser } = await signedIn({ isSiteAdmin: true });
    const bad = await admin.patch(`/api/admin/users/${ownerUser.id}`, { mayOrganise: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.mayOrganise).toBeDefined();
    const empty = await admin.patch(`/api/admin/users/${ownerUser.id}`, {});
    expect(empty.status).toBe(400);
    expect((await admin.patch('/api/admin/users/abc', { mayOrganise: true })).body.error.fields.id).toBeDefined();
    expect((await admin.patch('/api/admin/users/99999999', { mayOrganise: true })).status).toBe(404);
    const self = await admin.patch(`/api/admin/users/${adminUser.id}`, { isSiteAdmin: false });
    expect(self.status).toBe(400);
    expect(self.body.error.fields.isSiteAdmin).toBeDefined();
  });

  it('shows caught mail (demo mode) to the site admin only', async () => {
    const { client: owner } = await signedIn();
    expect((await owner.get('/api/admin/mail')).status).toBe(403);
    const { client: admin } = await signedIn({ isSiteAdmin: true });
    const target = await createUser();
    await (await apiClient()).post('/api/password-resets', { email: target.email });
    const listed = async () => ((await admin.get('/api/admin/mail')).body.mail as { id: number; to: string }[]).find((m) => m.to.includes(target.email));
    await expect.poll(listed).toBeDefined();
    const found = await listed();
    const one = await admin.get(`/api/admin/mail/${found!.id}`);
    expect(one.body.mail.text).toContain('/reset-password?token=');
    expect((await owner.get(`/api/admin/mail/${found!.id}`)).status).toBe(403);
  });
});
