import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { testApp } from '../../support/api-client';
import { listenApp } from '../../support/raw-http';
import { judgedShow } from '../../support/results-factory';
import { visitor } from '../../support/visitor';

// The visitors' award joins the judged ones when results are published: most votes wins, a tie is
// shared (common practice for a popular vote), and it gets its certificate and a line on the public page.
let server: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => (server = await listenApp()));
afterAll(async () => server.close());

const pdfText = (pdf: Buffer) => {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'placard-pc-')), 'c.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
};
const download = (client: { raw: ReturnType<typeof request.agent> }, url: string) =>
  client.raw.get(url).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });

describe('people’s choice in the published results', () => {
  it('goes to the most votes, shares a tie, and has its certificate and its place on the public page', async () => {
    const show = await judgedShow({ hotRods: ['Hiboy', 'Coupe'], customs: ['Sled'] });
    for (const [judge, title, points] of [[0, 'Hiboy', [9, 8, 5]], [1, 'Hiboy', [8, 8, 4]], [0, 'Coupe', [5, 5, 3]], [1, 'Coupe', [6, 6, 3]], [0, 'Sled', [7, 7, 4]], [1, 'Sled', [7, 7, 2]]] as const) {
      await show.score(judge, title, [...points]);
    }
    const base = `/api/events/${show.eventId}/peoples-choice`;
    expect((await show.organiser.client.post(`${base}/open`)).status).toBe(200);
    // Two votes each for Coupe and Sled, one for Hiboy: Coupe and Sled share the award.
    for (const title of ['Coupe', 'Coupe', 'Sled', 'Sled', 'Hiboy']) expect((await visitor(server.baseUrl).viewAndVote(show.car(title).code)).status).toBe(303);
    expect((await show.organiser.client.post(`${base}/close`)).status).toBe(200);
    expect((await show.publish()).status).toBe(200);

    const awards = (await show.organiser.client.get(`/api/events/${show.eventId}/results/awards`)).body.awards as Array<{ key: string; name: string; winners: Array<{ title: string }> }>;
    const pc = awards.find((a) => a.key === 'peoples-choice');
    expect(pc?.winners.map((w) => w.title).sort()).toEqual(['Coupe', 'Sled']);

    const pdf = await download(show.organiser.client, `/api/events/${show.eventId}/results/certificates.pdf?paper=a4&award=peoples-choice`);
    expect(pdf.status).toBe(200);
    const text = pdfText(pdf.body as Buffer);
    expect(text).toMatch(/PEOPLE’S\s+CHOICE/);
    expect(text).toMatch(/2 votes/);
    expect(text).toMatch(/Coupe/);
    expect(text).toMatch(/Sled/);

    const json = await request(testApp()).get(`/api/public/events/${(await show.organiser.client.get(`/api/events/${show.eventId}`)).body.event.slug}`);
    expect(json.body.event.results.peoplesChoice.map((l: { title: string; total: string; shared: boolean }) => [l.title, l.total, l.shared]).sort()).toEqual([
      ['Coupe', '2 votes', true],
      ['Sled', '2 votes', true],
    ]);
  });
});
