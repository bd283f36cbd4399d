import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// The feed is read back by a general-purpose XML parser (fast-xml-parser, a dev dependency), not by our own code.
import { parse as parseXml, validate as validateXml } from 'fast-xml-parser';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createFullBuild } from '../../support/build-factory';
import { listenApp, rawGet } from '../../support/raw-http';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';
import { jpegWithGps } from '../../support/images';
import { storePhotosForBuild } from '@server/services/media/photos';
import { DynoRun } from '@server/models/dyno-run';

checkPageVersionOnEveryRequest();
let http: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => {
  http = await listenApp();
});
afterAll(() => http.close());

async function signedIn(): Promise<{ client: ApiClient; userId: number }> {
  const { email, password, user } = await createUser({ name: 'Noor Aldane' });
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { client, userId: user.id };
}

const post = (over: Record<string, unknown> = {}) => ({ postedOn: '2025-06-14', title: 'First fire-up', body: 'It *ran*.\n\nSee https://example.test/video.', status: 'published', ...over });
// Version 3 leaves the five predefined entities for the caller to decode.
const XML_ENTITIES: Record<string, string> = { lt: '<', gt: '>', quot: '"', apos: "'", amp: '&' };
const decodeXml = (v: string) => v.replace(/&(lt|gt|quot|apos|amp);/g, (_m, name: string) => XML_ENTITIES[name]!);
const page = async (path: string) => (await rawGet(`${http.baseUrl}${path}`)).body.toString('utf8');

describe('the build log: the owner’s routes', () => {
  it('creates drafts and published posts, lists them newest first and edits and deletes them', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const base = `/api/builds/${build.id}/log`;
    const older = await client.post(base, post({ postedOn: '2024-03-01', title: 'Chassis on the jig', status: 'draft' }));
    expect(older.status).toBe(201);
    expect(older.body.post).toMatchObject({ title: 'Chassis on the jig', status: 'draft', photoIds: [], dynoRunId: null, weighInId: null });
    const newer = await client.post(base, post());
    expect(newer.status).toBe(201);
    const list = await client.get(base).expect(200);
    expect(list.body.posts.map((p: { title: string }) => p.title)).toEqual(['First fire-up', 'Chassis on the jig']);

    // Moving a post's date reorders the log.
    await client.patch(`${base}/${older.body.post.id}`, { postedOn: '2026-01-02' }).then((r) => expect(r.status).toBe(200));
    expect((await client.get(base)).body.posts[0].title).toBe('Chassis on the jig');

    expect((await client.delete(`${base}/${newer.body.post.id}`)).status).toBe(204);
    expect((await client.get(base)).body.posts).toHaveLength(1);
    expect((await client.delete(`${base}/${newer.body.post.id}`)).status).toBe(404);
  });

  it('names the field it refuses: no title, a bad date, too many photos, two measurements, the text rule', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const res = await client.post(`/api/builds/${build.id}/log`, { postedOn: '2025-02-30', title: '  ', body: 'x\u0000y', photoIds: [1, 2, 3, 4, 5, 6, 7] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['body', 'photoIds', 'postedOn', 'title']);
    const both = await client.post(`/api/builds/${build.id}/log`, post({ dynoRunId: 1, weighInId: 1 }));
    expect(both.status).toBe(400);
    expect(both.body.error.fields).toHaveProperty('weighInId');
  });

  it('links only this build’s own photos and dyno runs', async () => {
    const { client, userId } = await signedIn();
    const mine = await createFullBuild(userId);
    const other = await createFullBuild((await createUser()).user.id);
    const [otherPhoto] = await storePhotosForBuild(other.id, [{ buffer: await jpegWithGps(), originalName: 'a.jpg' }], ['']);
    const otherRun = await DynoRun.findOne({ where: { buildId: other.id } });
    const res = await client.post(`/api/builds/${mine.id}/log`, post({ photoIds: [otherPhoto!.id], dynoRunId: otherRun!.id }));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['dynoRunId', 'photoIds']);

    const [myPhoto] = await storePhotosForBuild(mine.id, [{ buffer: await jpegWithGps(), originalName: 'b.jpg' }], ['The jig']);
    const myRun = await DynoRun.findOne({ where: { buildId: mine.id } });
    const ok = await client.post(`/api/builds/${mine.id}/log`, post({ photoIds: [myPhoto!.id], dynoRunId: myRun!.id }));
    expect(ok.status).toBe(201);
    // Linking a weigh-in instead replaces the dyno run: one measurement at most.
    const { WeighIn } = await import('@server/models/weigh-in');
    const w = await WeighIn.findOne({ where: { buildId: mine.id } });
    const changed = await client.patch(`/api/builds/${mine.id}/log/${ok.body.post.id}`, { weighInId: w!.id });
    expect(changed.body.post).toMatchObject({ weighInId: w!.id, dynoRunId: null });
  });

  it('is the owner’s alone: another owner gets 404, anonymous 401, a missing build 404', async () => {
    const { userId } = await signedIn();
    const build = await createFullBuild(userId);
    const { client: stranger } = await signedIn();
    expect((await stranger.get(`/api/builds/${build.id}/log`)).status).toBe(404);
    expect((await stranger.post(`/api/builds/${build.id}/log`, post())).status).toBe(404);
    const anonymous = await apiClient();
    expect((await anonymous.get(`/api/builds/${build.id}/log`)).status).toBe(401);
    expect((await anonymous.post(`/api/builds/${build.id}/log`, post())).status).toBe(401);
    const { client } = await signedIn();
    expect((await client.get('/api/builds/2147483000/log')).status).toBe(404);
  });

  it('another owner cannot edit or delete a post (404) and it stays as it was', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const created = (await client.post(`/api/builds/${build.id}/log`, post())).body.post;
    const { client: stranger } = await signedIn();
    expect((await stranger.patch(`/api/builds/${build.id}/log/${created.id}`, { title: 'Taken' })).status).toBe(404);
    expect((await stranger.delete(`/api/builds/${build.id}/log/${created.id}`)).status).toBe(404);
    expect((await client.get(`/api/builds/${build.id}/log`)).body.posts[0].title).toBe('First fire-up');
  });
});

describe('the build log in public', () => {
  it('shows the newest published posts on the build page, never a draft, with the way to all posts', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const before = await page(`/c/${build.code}`);
    expect(before).not.toContain('id="log"');
    for (const [i, day] of ['2024-01-10', '2024-05-02', '2025-02-11', '2025-09-30'].entries()) {
      await client.post(`/api/builds/${build.id}/log`, post({ postedOn: day, title: `Step ${i + 1}` }));
    }
    await client.post(`/api/builds/${build.id}/log`, post({ postedOn: '2026-01-01', title: 'Secret draft', status: 'draft' }));
    const html = await page(`/c/${build.code}`);
    expect(html).toContain('Build log');
    expect(html).not.toContain('Secret draft');
    // The newest three, newest first; the fourth is on the log page.
    expect([...html.matchAll(/<h3>(Step \d)<\/h3>/g)].map((m) => m[1])).toEqual(['Step 4', 'Step 3', 'Step 2']);
    expect(html).toContain(`href="/c/${build.code}/log"`);
    expect(html).toContain('All 4 posts');
    // Light formatting, escaped and with safe links only.
    expect(html).toContain('<em>ran</em>');
    expect(html).toContain('<a href="https://example.test/video" rel="nofollow ugc noopener">https://example.test/video</a>');

    const all = await page(`/c/${build.code}/log`);
    expect([...all.matchAll(/<h3>(Step \d)<\/h3>/g)].map((m) => m[1])).toEqual(['Step 4', 'Step 3', 'Step 2', 'Step 1']);
    expect(all).not.toContain('Secret draft');
    expect(all).not.toMatch(/<script/i);
  });

  it('never lets typed markup through', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    await client.post(`/api/builds/${build.id}/log`, post({ title: '<img src=x onerror=alert(1)>', body: '<script>alert(1)</script> [x](javascript:alert(1)) javascript:alert(2)' }));
    for (const html of [await page(`/c/${build.code}`), await page(`/c/${build.code}/log`)]) {
      expect(html).not.toContain('<script>alert');
      expect(html).not.toContain('<img src=x');
      expect(html).not.toMatch(/href="javascript:/);
      expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    }
  });

  it('the page changes when a post is published, edited or deleted (the cached page follows)', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const created = (await client.post(`/api/builds/${build.id}/log`, post({ status: 'draft', title: 'Paint day' }))).body.post;
    expect(await page(`/c/${build.code}`)).not.toContain('Paint day');
    await client.patch(`/api/builds/${build.id}/log/${created.id}`, { status: 'published' });
    expect(await page(`/c/${build.code}`)).toContain('Paint day');
    await client.patch(`/api/builds/${build.id}/log/${created.id}`, { title: 'Paint and polish day' });
    expect(await page(`/c/${build.code}`)).toContain('Paint and polish day');
    await client.delete(`/api/builds/${build.id}/log/${created.id}`);
    expect(await page(`/c/${build.code}`)).not.toContain('Paint and polish day');
  });

  it('gives an Atom feed that an XML parser reads back, with published posts only and no private field', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId, { vin: 'VIN-CANARY-778', plate: 'PLATE-CANARY', ownerPhone: '+1 555 0100', ownerAddress: '12 Canary Road' });
    await client.post(`/api/builds/${build.id}/log`, post({ postedOn: '2025-01-05', title: 'Tom & Jerry’s <first> weekend' }));
    await client.post(`/api/builds/${build.id}/log`, post({ postedOn: '2025-08-20', title: 'Dyno day' }));
    await client.post(`/api/builds/${build.id}/log`, post({ title: 'Not yet', status: 'draft' }));
    const res = await rawGet(`${http.baseUrl}/c/${build.code}/log.atom`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/atom+xml; charset=utf-8');
    const xml = res.body.toString('utf8');
    expect(validateXml(xml)).toBe(true);
    const feed = parseXml(xml, { ignoreAttributes: false, attributeNamePrefix: '', textNodeName: '#text', parseAttributeValue: false, parseNodeValue: false, tagValueProcessor: decodeXml, attrValueProcessor: decodeXml }).feed;
    expect(feed.xmlns).toBe('http://www.w3.org/2005/Atom');
    // RFC 4287: a feed has id, title, updated and an author (or every entry has one); entries have id, title, updated.
    expect(feed.id).toBe(`http://127.0.0.1:3999/c/${build.code}/log`);
    expect(feed.title).toContain('build log');
    expect(Number.isNaN(Date.parse(feed.updated))).toBe(false);
    expect(feed.author.name).toBe('Noor Aldane');
    const entries = [feed.entry].flat();
    expect(entries.map((e: { title: string }) => e.title)).toEqual(['Dyno day', 'Tom & Jerry’s <first> weekend']);
    for (const e of entries) {
      expect(e.id).toMatch(/^http:\/\/127\.0\.0\.1:3999\/c\/\w+\/log#post-\d+$/);
      expect(Number.isNaN(Date.parse(e.updated))).toBe(false);
      expect(e.content.type).toBe('html');
      expect(e.content['#text']).toContain('<em>ran</em>');
    }
    for (const secret of ['VIN-CANARY-778', 'PLATE-CANARY', '555 0100', 'Canary Road', '@example.test']) expect(xml).not.toContain(secret);
  });

  it('answers 404 for the log page and feed of a draft or unknown build', async () => {
    const { client, userId } = await signedIn();
    const draft = await createFullBuild(userId, { published: false });
    await client.post(`/api/builds/${draft.id}/log`, post());
    for (const path of [`/c/${draft.code}/log`, `/c/${draft.code}/log.atom`, '/c/ZZZZZZZ/log', '/c/ZZZZZZZ/log.atom']) {
      expect((await rawGet(`${http.baseUrl}${path}`)).status).toBe(404);
    }
  });
});
