import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { once } from 'node:events';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { brotliDecompressSync } from 'node:zlib';
import { testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';
import { Build } from '@server/models/build';
import { User } from '@server/models/user';
import { PUBLIC_BUILDS_PER_PAGE } from '@shared/schemas/build';

// The home page and the list of every published build are server HTML (no script needed).
const titlesOn = (html: string) => [...html.matchAll(/<p class="t">([^<]*)<\/p>/g)].map((m) => m[1]);

describe('GET / (the home page)', () => {
  it('is complete HTML without the app bundle: recent builds, a search form and the shows taking entries; nothing private', async () => {
    const { user, email } = await createUser({ name: 'Orla Quenby' });
    const build = await createBuild(user.id, { title: `Home tile ${randomUUID().slice(0, 8)}`, published: true });
    await Build.update({ vin: 'CANARY-HOME-VIN', plate: 'CANARY-HOME', ownerPhone: '555-0199' }, { where: { id: build.id } });

    const res = await request(testApp()).get('/');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/html/);
    expect(res.text).toContain('The whole build, one scan away.');
    expect(titlesOn(res.text)).toContain(build.title);
    expect(res.text).toContain(`href="/c/${build.code}"`);
    expect(res.text).toMatch(/<form class="find"[^>]*action="\/c"[^>]*method="get"/);
    expect(res.text).toMatch(/Shows taking entries/);
    expect(res.text).not.toMatch(/<script/i);
    for (const secret of ['CANARY-HOME', '555-0199', email]) expect(res.text).not.toContain(secret);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('is sent compressed, under 50 KB before images, and a revisit is a 304', async () => {
    // The raw bytes on the wire (supertest would decompress them).
    const server = testApp().listen(0, '127.0.0.1');
    await once(server, 'listening');
    try {
      const { port } = server.address() as AddressInfo;
      const raw = await new Promise<{ headers: http.IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
        http.get({ host: '127.0.0.1', port, path: '/', headers: { 'accept-encoding': 'br' } }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
        }).on('error', reject);
      });
      expect(raw.headers['content-encoding']).toBe('br');
      expect(raw.headers.vary).toMatch(/Accept-Encoding/);
      expect(raw.body.length).toBeLessThan(50 * 1024);
      expect(brotliDecompressSync(raw.body).toString('utf8')).toContain('The whole build, one scan away.');

      // Other test files publish builds meanwhile, and the home page lists the newest: a 200 with a new
      // version is right when the page changed. A revisit while it did not is a 304.
      const revisit = async () => {
        const first = await request(testApp()).get('/');
        const again = await request(testApp()).get('/').set('If-None-Match', String(first.headers.etag));
        if (again.status === 200) expect(again.headers.etag).not.toBe(first.headers.etag);
        return again.status;
      };
      await expect.poll(revisit).toBe(304);
    } finally {
      server.close();
    }
  });
});

describe('GET /c (every published build)', () => {
  it('finds by title (any case, % and _ typed as themselves) and narrows by style; drafts and disabled accounts stay out', async () => {
    const tag = randomUUID().slice(0, 8);
    const { user } = await createUser();
    const { user: gone } = await createUser();
    const coupe = await createBuild(user.id, { title: `Ember Coupe ${tag}`, published: true });
    const truck = await createBuild(user.id, { title: `Ember Truck ${tag}`, published: true });
    await createBuild(user.id, { title: `Ember Draft ${tag}`, published: false });
    await createBuild(gone.id, { title: `Ember Hidden ${tag}`, published: true });
    await User.update({ disabledAt: new Date() }, { where: { id: gone.id } });
    await Build.update({ style: 'hot-rod' }, { where: { id: coupe.id } });
    await Build.update({ style: 'truck' }, { where: { id: truck.id } });

    const all = await request(testApp()).get(`/c?q=${encodeURIComponent(`ember ${tag}`.split(' ')[1]!)}`);
    expect(all.status).toBe(200);
    expect(titlesOn(all.text).sort()).toEqual([coupe.title, truck.title].sort());
    expect(all.text).toContain('2 builds matching');

    const trucks = await request(testApp()).get(`/c?q=${tag}&style=truck`);
    expect(titlesOn(trucks.text)).toEqual([truck.title]);
    expect(trucks.text).toContain('1 build matching');

    const wildcard = await request(testApp()).get(`/c?q=${encodeURIComponent(`%${tag}`)}`);
    expect(titlesOn(wildcard.text)).toEqual([]);
    expect(wildcard.text).toContain('No published build matches.');

    // The form's "any style" sends an empty style.
    const anyStyle = await request(testApp()).get(`/c?q=${tag}&style=`);
    expect(titlesOn(anyStyle.text)).toHaveLength(2);
  });

  it('pages through the builds with links that keep the search', async () => {
    const tag = randomUUID().slice(0, 8);
    const { user } = await createUser();
    for (let i = 0; i < PUBLIC_BUILDS_PER_PAGE + 2; i++) await createBuild(user.id, { title: `Pager ${tag} ${String(i).padStart(2, '0')}`, published: true });

    const first = await request(testApp()).get(`/c?q=${tag}`);
    expect(titlesOn(first.text)).toHaveLength(PUBLIC_BUILDS_PER_PAGE);
    expect(first.text).toContain(`${PUBLIC_BUILDS_PER_PAGE + 2} builds matching`);
    expect(first.text).toContain('page 1 of 2');
    expect(first.text).toContain(`href="/c?q=${tag}&amp;page=2"`);

    const second = await request(testApp()).get(`/c?q=${tag}&page=2`);
    expect(titlesOn(second.text)).toHaveLength(2);
    expect(second.text).toContain(`href="/c?q=${tag}"`);
    expect(new Set([...titlesOn(first.text), ...titlesOn(second.text)]).size).toBe(PUBLIC_BUILDS_PER_PAGE + 2);

    // A page past the end (an old link, a typed number) says so and links back to the first.
    const past = await request(testApp()).get(`/c?q=${tag}&page=9`);
    expect(past.status).toBe(200);
    expect(titlesOn(past.text)).toHaveLength(0);
    expect(past.text).toContain('There is no build on page 9.');
    expect(past.text).toContain(`<a href="/c?q=${tag}">Back to the first page</a>`);
  });

  it('answers a search it cannot read with 400 and a page naming the problem, never a 500', async () => {
    for (const [query, message] of [
      ['page=abc', 'Page must be a number.'],
      ['page=0', 'Page is at least 1.'],
      ['style=spaceship', 'Choose a style from the list.'],
      ['q=%00', 'Search contains a character we cannot keep'],
      [`q=${'x'.repeat(81)}`, 'Search'],
      ['q=a&q=b', 'Search must be text.'],
    ] as const) {
      const res = await request(testApp()).get(`/c?${query}`);
      expect(res.status, query).toBe(400);
      expect(res.text, query).toContain(message);
    }
  });
});
