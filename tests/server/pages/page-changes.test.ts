import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { sequelize } from '@server/db/sequelize';
import { publicPageCache } from '@server/pages/page-cache';
import { testApp } from '../../support/api-client';
import { ownerWithBuild, showWithClasses } from '../../support/event-factory';
import { checkIn, showInJudging } from '../../support/judging-factory';
import { judgedShow } from '../../support/results-factory';
import { listenForPageChanges, pageChangesHeard } from '../../support/page-cache';

listenForPageChanges();

// Every query this process sends, to prove a cached page costs none; but the API limiter's merge of its
// counters, which runs once a second whatever is asked (BatchedRateLimitStore).
let queries = 0;
const countQuery = (_options: unknown, query: unknown) => void (String((query as { sql?: unknown }).sql).includes('rate_limit_hits') || queries++);
beforeAll(() => sequelize.addHook('afterQuery', 'count-for-page-test', countQuery));
afterAll(() => sequelize.removeHook('afterQuery', 'count-for-page-test'));

const get = (path: string) => request(testApp()).get(path).set('Accept-Encoding', 'gzip, deflate, br');
const textOf = async (path: string) => (await get(path)).text;
/** The page as cached, then asked again: the second answer must cost no query at all. */
async function cachedText(path: string): Promise<string> {
  await pageChangesHeard(); // the setup's own changes are in, so they cannot drop the page between the two asks
  await get(path).expect(200);
  const before = queries;
  const again = await get(path).expect(200);
  expect(queries - before, `${path} served from the cache`).toBe(0);
  return again.text;
}
// A committed change arrives as a notification a moment later (same process or another): well under a second.
const soon = { timeout: 1000, interval: 20 };

describe('a change to a show reaches its cached public pages at once', () => {
  it('a new entry appears on the show page, and the car’s page names the show', async () => {
    const { eventId, classIds, slug } = await showWithClasses({ settings: { entryFee: 0 } });
    const owner = await ownerWithBuild('Late-night roadster');
    expect(await cachedText(`/e/${slug}`)).not.toContain('Late-night roadster');
    const carPage = await cachedText(`/c/${owner.build.code}`);
    expect(carPage).not.toMatch(/id="show-entry"/);

    expect((await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).status).toBe(201);
    await expect.poll(() => textOf(`/e/${slug}`), soon).toContain('Late-night roadster');
    await expect.poll(() => textOf(`/c/${owner.build.code}`), soon).toMatch(/id="show-entry"/);
    // And the new pages are cached again.
    expect(await cachedText(`/e/${slug}`)).toContain('Late-night roadster');
  });

  it('a check-in marks the car on the field; opening people’s choice puts the vote on the car’s page', async () => {
    const show = await showInJudging({ notArrived: 1 });
    const late = show.entries.at(-1)!;
    const page = await cachedText(`/e/${show.slug}`);
    expect(page.match(/On the field/g)).toHaveLength(show.entries.length - 1);
    await checkIn(show.organiser.client, show.eventId, late.number);
    await expect.poll(async () => (await textOf(`/e/${show.slug}`)).match(/On the field/g)?.length, soon).toBe(show.entries.length);

    const code = show.owner.build.code;
    expect(await cachedText(`/c/${code}`)).not.toContain('Vote for this car');
    expect(await cachedText(`/e/${show.slug}`)).not.toContain('People’s choice voting is open');
    expect((await show.organiser.client.post(`/api/events/${show.eventId}/peoples-choice/open`)).status).toBe(200);
    await expect.poll(() => textOf(`/c/${code}`), soon).toContain('Vote for this car');
    await expect.poll(() => textOf(`/e/${show.slug}`), soon).toContain('People’s choice voting is open');
    // The visitor's box costs no query either: it is filled from their cookies into the cached page.
    expect(await cachedText(`/c/${code}`)).toContain('Vote for this car');
  });

  it('published results lead the show page, and a renamed car follows on it', async () => {
    const show = await judgedShow({ hotRods: ['Blue Deuce', 'Red Ford'], customs: ['Green Merc'] });
    await show.score(0, 'Blue Deuce', [10, 10, 5]);
    await show.score(1, 'Blue Deuce', [10, 10, 5]);
    await show.score(0, 'Red Ford', [5, 5, 3]);
    await show.score(1, 'Red Ford', [5, 5, 3]);
    await show.score(0, 'Green Merc', [7, 7, 4]);
    await show.score(1, 'Green Merc', [7, 7, 4]);
    expect(await cachedText(`/e/${show.slug}`)).not.toContain('id="results"');
    expect((await show.publish(true)).status).toBe(200);
    await expect.poll(() => textOf(`/e/${show.slug}`), soon).toContain('id="results"');

    const car = show.car('Red Ford');
    expect((await car.owner.client.patch(`/api/builds/${car.owner.build.id}`, { title: 'Red Ford Tudor' })).status).toBe(200);
    await expect.poll(() => textOf(`/e/${show.slug}`), soon).toContain('Red Ford Tudor');
  });

  it('a change elsewhere leaves a cached page in place', async () => {
    const { slug } = await showWithClasses({ settings: { entryFee: 0 } });
    await cachedText(`/e/${slug}`);
    const other = await showWithClasses({ settings: { entryFee: 0 } });
    const owner = await ownerWithBuild('Somewhere else');
    expect((await owner.client.post(`/api/events/${other.eventId}/entries`, { buildId: owner.build.id, classId: other.classIds[0] })).status).toBe(201);
    // The control: the other show's page hears of its entry...
    await expect.poll(() => textOf(`/e/${other.slug}`), soon).toContain('Somewhere else');
    // ...and this show's page was never dropped.
    await pageChangesHeard();
    const before = queries;
    await get(`/e/${slug}`).expect(200);
    expect(queries).toBe(before);
    expect(publicPageCache.size).toBeGreaterThan(0);
  });

  it('another car’s check-in leaves a car’s cached page in place; its class renamed reaches it', async () => {
    const show = await showInJudging({ notArrived: 1 });
    const code = show.owner.build.code; // the first car entered
    const late = show.entries.at(-1)!;
    await cachedText(`/c/${code}`);
    await checkIn(show.organiser.client, show.eventId, late.number);
    // The control: the show's page hears of the check-in...
    await expect.poll(async () => (await textOf(`/e/${show.slug}`)).match(/On the field/g)?.length, soon).toBe(show.entries.length);
    // ...while the first car's page was never dropped.
    const before = queries;
    await get(`/c/${code}`).expect(200);
    expect(queries, 'the car’s page served from the cache').toBe(before);

    const classId = show.entries[0]!.classId;
    expect((await show.organiser.client.patch(`/api/events/${show.eventId}/classes/${classId}`, { name: 'Renamed hot rods', capacity: null })).status).toBe(200);
    await expect.poll(() => textOf(`/c/${code}`), soon).toContain('Renamed hot rods');
  });
});

describe('a change to the build over time reaches the car’s cached page at once', () => {
  it('a post published and a question answered appear; a draft does not', async () => {
    const owner = await ownerWithBuild('Quiet sedan');
    const base = `/api/builds/${owner.build.id}`;
    expect(await cachedText(`/c/${owner.build.code}`)).not.toContain('Build log');
    const draft = (await owner.client.post(`${base}/log`, { postedOn: '2025-05-01', title: 'Seats out', body: 'Old foam gone.' })).body.post;
    expect(await cachedText(`/c/${owner.build.code}`)).not.toContain('Seats out');
    await owner.client.patch(`${base}/log/${draft.id}`, { status: 'published' });
    await expect.poll(() => textOf(`/c/${owner.build.code}`), soon).toContain('Seats out');

    expect(await cachedText(`/c/${owner.build.code}`)).not.toContain('Why so quiet?');
    await owner.client.post(`${base}/questions`, { question: 'Why so quiet?', answer: 'A long exhaust.' });
    await expect.poll(() => textOf(`/c/${owner.build.code}`), soon).toContain('Why so quiet?');
  });
});
