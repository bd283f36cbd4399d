import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type request from 'supertest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { ReadOut } from '@shared/schemas/read-out';
import { DEFAULT_RESULT_RULES } from '@shared/schemas/judging';
import { listenApp } from '../../support/raw-http';
import { judgedShow } from '../../support/results-factory';
import { visitor } from '../../support/visitor';

// Results name each car's owner: their display name, and hometown and club where the owner gave them on
// their account. The sheet, the certificates and the announcer's read-out carry them; nothing private does.
let server: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => (server = await listenApp()));
afterAll(async () => server.close());

const pdfText = (pdf: Buffer) => {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'placard-owners-')), 'r.pdf');
  writeFileSync(file, pdf);
  // Without -layout, so a credit that wraps in its column still reads as one run of words.
  return execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
};
const download = async (client: { raw: ReturnType<typeof request.agent> }, url: string) => {
  const res = await client.raw.get(url).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  expect(res.status).toBe(200);
  return pdfText(res.body as Buffer);
};

async function publishedShowWithOwners() {
  // Best of show keeps its class place here, so the hot rods' class has three places to read.
  const show = await judgedShow({ hotRods: ['Hiboy', 'Coupe', 'Tudor'], customs: ['Sled'] }, { ...DEFAULT_RESULT_RULES, bestOfShowKeepsClassPlace: true });
  const credits: Record<string, { name: string; hometown?: string; club?: string }> = {
    Hiboy: { name: 'Marisol Quaye', hometown: 'Fennick Hollow', club: 'Lantern Street Rodders' },
    Coupe: { name: 'Idris Vantongeren', hometown: 'Saltmarsh' },
    Tudor: { name: 'Petra Okonkwo-Lund' },
    Sled: { name: 'Yusuf Brandvold', club: 'Low and Slow Society' },
  };
  for (const [title, credit] of Object.entries(credits)) expect((await show.car(title).owner.client.patch('/api/account', credit)).status).toBe(200);
  for (const [judge, title, points] of [[0, 'Hiboy', [9, 8, 5]], [1, 'Hiboy', [8, 8, 4]], [0, 'Coupe', [7, 6, 4]], [1, 'Coupe', [7, 6, 3]], [0, 'Tudor', [5, 5, 3]], [1, 'Tudor', [5, 4, 3]], [0, 'Sled', [7, 7, 4]], [1, 'Sled', [7, 7, 2]]] as const) {
    await show.score(judge, title, [...points]);
  }
  const base = `/api/events/${show.eventId}/peoples-choice`;
  expect((await show.organiser.client.post(`${base}/open`)).status).toBe(200);
  for (const title of ['Tudor', 'Tudor', 'Sled']) expect((await visitor(server.baseUrl).viewAndVote(show.car(title).code)).status).toBe(303);
  expect((await show.organiser.client.post(`${base}/close`)).status).toBe(200);
  expect((await show.publish()).status).toBe(200);
  return show;
}

describe('owners on the published results', () => {
  it('prints the owner’s name, and hometown and club where given, on the sheet and every certificate, people’s choice included, and no e-mail', async () => {
    const show = await publishedShowWithOwners();
    const emails = show.entries.map((e) => e.owner.email);

    const sheet = await download(show.organiser.client, `/api/events/${show.eventId}/results/sheet.pdf?paper=letter`);
    expect(sheet).toContain('Marisol Quaye, Fennick Hollow · Lantern Street Rodders');
    expect(sheet).toContain('Idris Vantongeren, Saltmarsh');
    expect(sheet).toContain('Yusuf Brandvold, Low and Slow Society');
    expect(sheet).toMatch(/PEOPLE’S CHOICE.*Tudor Petra Okonkwo-Lund/);
    for (const email of emails) expect(sheet).not.toContain(email);

    const certificates = await download(show.organiser.client, `/api/events/${show.eventId}/results/certificates.pdf?paper=a4`);
    expect(certificates).toContain('Marisol Quaye, Fennick Hollow · Lantern Street Rodders');
    expect(certificates).toContain('Idris Vantongeren, Saltmarsh');
    for (const email of emails) expect(certificates).not.toContain(email);

    const peoplesChoice = await download(show.organiser.client, `/api/events/${show.eventId}/results/certificates.pdf?paper=a4&award=peoples-choice`);
    expect(peoplesChoice).toMatch(/PEOPLE’S CHOICE AWARDED TO Tudor Petra Okonkwo-Lund Number \d+/);
    expect(peoplesChoice).toContain('2 votes');
  });

  it('gives the announcer each class third to first, then best of show and people’s choice, with the owners’ public words only', async () => {
    const show = await publishedShowWithOwners();
    const res = await show.organiser.client.get(`/api/events/${show.eventId}/results/read-out`);
    expect(res.status).toBe(200);
    const readOut = res.body.readOut as ReadOut;
    expect(readOut.sections.map((s) => [s.kind, s.calls.map((c) => [c.place, c.title, c.owner?.name])])).toEqual([
      ['class', [[3, 'Tudor', 'Petra Okonkwo-Lund'], [2, 'Coupe', 'Idris Vantongeren'], [1, 'Hiboy', 'Marisol Quaye']]],
      ['class', [[1, 'Sled', 'Yusuf Brandvold']]],
      ['best-of-show', [[1, 'Hiboy', 'Marisol Quaye']]],
      ['peoples-choice', [[1, 'Tudor', 'Petra Okonkwo-Lund']]],
    ]);
    expect(readOut.sections[0]!.calls[2]!.owner).toEqual({ name: 'Marisol Quaye', hometown: 'Fennick Hollow', club: 'Lantern Street Rodders' });
    const json = JSON.stringify(res.body);
    for (const e of show.entries) expect(json).not.toContain(e.owner.email);
    expect(Object.keys(readOut.sections[0]!.calls[0]!).sort()).toEqual(['number', 'owner', 'place', 'shared', 'title']);

    // Only the show's organisers hear it; to anyone else the show's results tools do not exist.
    expect((await show.car('Hiboy').owner.client.get(`/api/events/${show.eventId}/results/read-out`)).status).toBe(404);
  });
});
