import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';
import { Build } from '@server/models/build';

describe('GET /api/public/builds (the home page list)', () => {
  it('lists published builds only, newest first, with nothing private', async () => {
    const { user, email } = await createUser({ name: 'Tamsin Orrell' });
    const draft = await createBuild(user.id, { title: 'Still a draft', published: false });
    const shown = await createBuild(user.id, { title: 'Shown to everyone', published: true });
    await Build.update({ vin: 'CANARY-LIST-VIN', plate: 'CANARY-LIST', ownerPhone: '555-0142', ownerAddress: '4 Canary Close' }, { where: { id: [draft.id, shown.id] } });

    const res = await request(testApp()).get('/api/public/builds?limit=24');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('public, max-age=60');
    const codes = res.body.builds.map((b: { code: string }) => b.code);
    expect(codes).toContain(shown.code);
    expect(codes).not.toContain(draft.code);
    const tile = res.body.builds.find((b: { code: string }) => b.code === shown.code);
    expect(Object.keys(tile).sort()).toEqual(['code', 'cover', 'modelYear', 'style', 'title', 'url']);
    expect(tile.url).toBe(`http://127.0.0.1:3999/c/${shown.code}`);
    for (const secret of ['CANARY-LIST', '555-0142', 'Canary Close', email]) expect(JSON.stringify(res.body)).not.toContain(secret);
    // No session is made for it.
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('checks its limit', async () => {
    const res = await request(testApp()).get('/api/public/builds?limit=500');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.limit).toMatch(/at most 24/);
  });
});
