import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild, createFullBuild } from '../../support/build-factory';
import { listenApp, rawGet } from '../../support/raw-http';
import { jpegWithGps, sidewaysJpeg } from '../../support/images';
import { randomBuildCode } from '@server/services/builds/build-codes';
import { storePhotosForBuild } from '@server/services/media/photos';
import { publicPageCache } from '@server/pages/page-cache';
import { Build } from '@server/models/build';

let http: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => {
  http = await listenApp();
});
afterAll(() => http.close());

const page = (code: string, query = '') => request(testApp()).get(`/c/${code}${query}`);

describe('GET /c/:code, the public build page', () => {
  it('is complete HTML with the specs, readable without any script, and never the app bundle', async () => {
    const { user } = await createUser({ name: 'Rowan Teller' });
    const build = await createFullBuild(user.id);
    const res = await page(build.code, '?units=imperial').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/html; charset=utf-8/);
    const html = res.text;
    expect(html.startsWith('<!doctype html>')).toBe(true);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\/assets\/index-/);
    expect(html).toContain('<style>');
    for (const text of ['1969 Night Shift', 'fastback coupe', 'owned by Rowan Teller', 'Engine', 'Drivetrain', 'Chassis and suspension', 'Brakes', 'Wheels and tyres', 'Body and interior', 'Extras', '275/35R18', 'Double-wishbone', 'The story', 'Credits', 'Kestrel Lane Paint', 'Corner weights']) {
      expect(html).toContain(text);
    }
    // Provenance in words, and the engineering caution beside chassis and brakes.
    expect(html).toMatch(/650\u00a0hp est\. at 6,400 rpm/);
    expect(html).toContain('Estimates for presentation, not engineering approval');
    // Dyno curves drawn on the server, two runs overlaid.
    const svg = html.match(/<svg[\s\S]*?<\/svg>/)?.[0] ?? '';
    expect(svg.match(/<path /g)?.length).toBe(4);
    // A place for the show entry and the vote, empty until events exist.
    expect(html).not.toContain('id="show-entry"');
  });

  it('shows the figures in the units the visitor picks, with links that work without script', async () => {
    const { user } = await createUser();
    const build = await createFullBuild(user.id);
    const imperial = (await page(build.code, '?units=imperial').expect(200)).text;
    const metric = (await page(build.code, '?units=metric').expect(200)).text;
    // The weigh-in (measured) wins over the owner's estimate.
    expect(imperial).toMatch(/3,415\u00a0lb/);
    expect(metric).toMatch(/1,549\u00a0kg/);
    expect(metric).toContain('href="?units=imperial"');
    expect(imperial).toMatch(/href="\?units=imperial" [^>]*aria-current="true"/);
    // Without a choice, US English reads US customary, British English as the trade there writes
    // it (kilograms, but hp and lb·ft), and everyone else metric.
    expect((await page(build.code).set('Accept-Language', 'en-US,en;q=0.8').expect(200)).text).toMatch(/3,415\u00a0lb/);
    const uk = await page(build.code).set('Accept-Language', 'en-GB').expect(200);
    expect(uk.text).toMatch(/1,549\u00a0kg/);
    expect(uk.text).toMatch(/650\u00a0hp est\. at 6,400 rpm/);
    expect(uk.text).toMatch(/href="\?units=uk" [^>]*aria-current="true"/);
    expect((await page(build.code).set('Accept-Language', 'de-DE').expect(200)).text).toMatch(/485\u00a0kW est\./);
    expect(uk.headers.vary).toBe('Accept-Encoding, Accept-Language, Cookie');
  });

  it('remembers the visitor’s pick of units for every build they open, and says what decided the page', async () => {
    const { user } = await createUser();
    const first = await createFullBuild(user.id);
    const second = await createFullBuild(user.id);
    const agent = request.agent(testApp());
    const picked = await agent.get(`/c/${first.code}?units=imperial`).set('Accept-Language', 'de-DE').expect(200);
    expect(picked.headers['set-cookie']?.[0]).toMatch(/^placard-units=imperial;.*Path=\/c;.*HttpOnly/);
    // An answer that sets a cookie is never stored by a shared cache; one decided by its address varies only by encoding.
    expect(picked.headers['cache-control']).toMatch(/^private,/);
    expect(picked.headers.vary).toBe('Accept-Encoding');

    const next = await agent.get(`/c/${second.code}`).set('Accept-Language', 'de-DE').expect(200);
    expect(next.text).toMatch(/3,415\u00a0lb/);
    expect(next.text).toMatch(/href="\?units=imperial" [^>]*aria-current="true"/);
    expect(next.headers['set-cookie']).toBeUndefined();
    expect(next.headers['cache-control']).toMatch(/^public,/);
    expect(next.headers.vary).toBe('Accept-Encoding, Accept-Language, Cookie');

    // A cookie that is not one of the choices is ignored.
    const odd = await request(testApp()).get(`/c/${second.code}`).set('Cookie', 'placard-units=furlongs').set('Accept-Language', 'de-DE').expect(200);
    expect(odd.text).toMatch(/1,549\u00a0kg/);
  });

  it('says each thing once: the displacement, the engine line and the engineering caution', async () => {
    const { user } = await createUser();
    const build = await createFullBuild(user.id);
    const html = (await page(build.code, '?units=metric').expect(200)).text.replace(/<head>[\s\S]*<\/head>/, '');
    const count = (re: RegExp) => html.match(re)?.length ?? 0;
    expect(count(/Estimates for presentation, not engineering approval/g)).toBe(1);
    expect(count(/<dt>Displacement<\/dt>/g)).toBe(1);
    expect(count(/5\.4\u00a0L/g)).toBe(1);
    expect(count(/class="eng"/g)).toBe(1);
  });

  it('has Open Graph and Twitter card tags with the cover, and sized, lazy, srcset images', async () => {
    const { user } = await createUser();
    const build = await createFullBuild(user.id);
    await storePhotosForBuild(build.id, [
      { buffer: await jpegWithGps(), originalName: 'front.jpg' },
      { buffer: await sidewaysJpeg(), originalName: 'side.jpg' },
    ]);
    const html = (await page(build.code).expect(200)).text;
    expect(html).toMatch(/<meta property="og:title" content="1969 Night Shift: fastback coupe"\/>/);
    expect(html).toMatch(/<meta property="og:image" content="http:\/\/127\.0\.0\.1:3999\/media\/photos\/[0-9a-f]{32}-960\.jpg"\/>/);
    expect(html).toContain('<meta name="twitter:card" content="summary_large_image"/>');
    const imgs = html.match(/<img [^>]*>/g) ?? [];
    expect(imgs).toHaveLength(2);
    for (const img of imgs) {
      expect(img).toMatch(/width="\d+"/);
      expect(img).toMatch(/height="\d+"/);
      expect(img).toMatch(/srcSet="[^"]*480w[^"]*960w/i);
    }
    expect(imgs[1]).toContain('loading="lazy"');
    expect(html).toMatch(/<source type="image\/webp" srcSet="[^"]+\.webp 480w/);
  });

  it('sends gzip and brotli, under 30 KB compressed before images', async () => {
    const { user } = await createUser();
    const build = await createFullBuild(user.id);
    const plain = await rawGet(`${http.baseUrl}/c/${build.code}`);
    const gz = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': 'gzip' });
    const br = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': 'gzip, deflate, br' });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(br.headers['content-encoding']).toBe('br');
    expect(gunzipSync(gz.body).equals(plain.body)).toBe(true);
    expect(brotliDecompressSync(br.body).equals(plain.body)).toBe(true);
    expect(gz.headers.vary).toContain('Accept-Encoding');
    expect(br.body.length).toBeLessThan(30 * 1024);
    expect(gz.body.length).toBeLessThan(30 * 1024);
    expect(gz.headers.etag).toBe(plain.headers.etag);
    // A refusal (q=0) is honoured; "*" stands for brotli too.
    const noBr = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': 'br;q=0, gzip' });
    expect(noBr.headers['content-encoding']).toBe('gzip');
    const any = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': '*' });
    expect(any.headers['content-encoding']).toBe('br');
    const none = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': 'br;q=0, gzip;q=0' });
    expect(none.headers['content-encoding']).toBeUndefined();
  });

  it('answers a matching If-None-Match with 304 and no body', async () => {
    const { user } = await createUser();
    const build = await createFullBuild(user.id);
    const first = await page(build.code).expect(200);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\/"[\w-]+"$/);
    const again = await page(build.code).set('If-None-Match', etag).expect(304);
    expect(again.text ?? '').toBe('');
    expect(again.headers.etag).toBe(etag);
    await page(build.code).set('If-None-Match', 'W/"something-else"').expect(200);
  });

  it('caches the rendered page and renders it again when the build changes', async () => {
    const { user } = await createUser();
    const build = await createFullBuild(user.id);
    const trust = publicPageCache.revalidateAfterMs;
    try {
      publicPageCache.revalidateAfterMs = 60_000; // trust the cache: nothing changed, the same page comes back
      const first = await page(build.code).expect(200);
      const cached = await page(build.code).expect(200);
      expect(cached.headers.etag).toBe(first.headers.etag);

      // A change reaches the page by its notification when this process listens, else at the version check.
      await Build.update({ title: 'Second Shift' }, { where: { id: build.id } });
      publicPageCache.revalidateAfterMs = 0; // every request checks the build's version
      const fresh = await page(build.code).expect(200);
      expect(fresh.text).toContain('Second Shift');
      expect(fresh.headers.etag).not.toBe(first.headers.etag);
      // The old validator no longer matches; the new one does.
      await page(build.code).set('If-None-Match', first.headers.etag as string).expect(200);
      await page(build.code).set('If-None-Match', fresh.headers.etag as string).expect(304);

      // Unpublishing takes the page down at the next check, with the same 404 as an unknown code.
      await Build.update({ published: false }, { where: { id: build.id } });
      await page(build.code).expect(404);
    } finally {
      publicPageCache.revalidateAfterMs = trust;
    }
  });

  it('answers unknown and unpublished codes with the same plain 404 page', async () => {
    const { user } = await createUser();
    const draft = await createBuild(user.id, { published: false });
    const unpublished = await page(draft.code).expect(404);
    const unknown = await page(randomBuildCode()).expect(404);
    const malformed = await page('not-a-code').expect(404);
    expect(unpublished.text).toBe(unknown.text);
    expect(malformed.text).toBe(unknown.text);
    for (const h of ['content-type', 'cache-control', 'content-length', 'etag', 'vary']) {
      expect(unpublished.headers[h]).toBe(unknown.headers[h]);
    }
    expect(unknown.text).not.toMatch(/<script/i);
    expect(unknown.text).not.toContain(draft.title);
  });
});

describe('GET /api/public/builds/:code, the JSON twin', () => {
  it('has the same public fields and the computed figures', async () => {
    const { user } = await createUser({ name: 'Rowan Teller' });
    const build = await createFullBuild(user.id);
    const res = await request(testApp()).get(`/api/public/builds/${build.code}`).expect(200);
    const b = res.body.build;
    expect(b.code).toBe(build.code);
    expect(b.url).toBe(`http://127.0.0.1:3999/c/${build.code}`);
    expect(b.ownerName).toBe('Rowan Teller');
    expect(Object.keys(b.sections).sort()).toEqual(['body', 'brakes', 'chassis', 'drivetrain', 'engine', 'extra', 'wheels']);
    expect(b.dynoRuns).toHaveLength(2);
    const power = b.keyFigures.find((f: { key: string }) => f.key === 'power');
    // The measured dyno figure wins over the owner's estimate.
    expect(power).toMatchObject({ provenance: 'measured', measuredOn: '2026-04-18', imperial: { unit: 'hp', value: 548 } });
    expect(b.keyFigures.map((f: { key: string }) => f.key)).toEqual(['power', 'torque', 'weight', 'powerToWeight', 'displacement']);
    expect(b.engineLine.metric).toBe('5.4\u00a0L V8, supercharged (twin-screw), 0.9\u00a0bar est. boost, aluminium block, E85');
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('answers unknown and unpublished codes alike', async () => {
    const { user } = await createUser();
    const draft = await createBuild(user.id, { published: false });
    const a = await request(testApp()).get(`/api/public/builds/${draft.code}`).expect(404);
    const b = await request(testApp()).get(`/api/public/builds/${randomBuildCode()}`).expect(404);
    expect(a.body).toEqual(b.body);
  });
});
