import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';

async function signedIn() {
  const { email, password } = await createUser({ name: 'Ada Quillfeather' });
  const client = await apiClient();
  await client.signIn(email, password);
  return { client, email };
}

describe("the owner's preview of the public page", () => {
  it('shows a draft to its owner as visitors will see it, with nothing private and no caching', async () => {
    const { client, email } = await signedIn();
    const { body } = await client.post('/api/builds', { title: 'Draft roadster', modelYear: 1932 });
    const id = body.build.id;
    await client.raw.put(`/api/builds/${id}/private`).set('X-CSRF-Token', client.csrf).send({ vin: 'CANARY-VIN-PREVIEW', plate: 'CANARY-PL', ownerPhone: '+1 555 0199', ownerAddress: '9 Canary Row' });
    await client.raw.put(`/api/builds/${id}/sections/engine`).set('X-CSRF-Token', client.csrf).send({ cylinders: 8, layout: 'V' });

    const res = await client.get(`/api/builds/${id}/preview?units=imperial`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/html/);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.text).toContain('Preview of a draft');
    expect(res.text).toContain('1932 Draft roadster');
    expect(res.text).toContain('noindex');
    for (const secret of ['CANARY-VIN-PREVIEW', 'CANARY-PL', '555 0199', 'Canary Row', email]) expect(res.text).not.toContain(secret);

    // The public address itself still answers "not found" for the draft.
    expect((await client.get(`/c/${body.build.code}`)).status).toBe(404);
  });

  it('is for the owner only, and checks its query', async () => {
    const { client } = await signedIn();
    const { body } = await client.post('/api/builds', { title: 'Mine' });
    const other = await signedIn();
    expect((await other.client.get(`/api/builds/${body.build.id}/preview`)).status).toBe(404);
    expect((await (await apiClient()).get(`/api/builds/${body.build.id}/preview`)).status).toBe(401);
    const bad = await client.get(`/api/builds/${body.build.id}/preview?units=furlongs`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.units).toBe('Units must be metric, uk or imperial.');
  });
});
