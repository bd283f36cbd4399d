import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { ReadOut } from '@shared/schemas/read-out';
import type { EntryTableRow } from '@shared/schemas/show-day';
import { testApp } from '../../support/api-client';
import { judgedShow } from '../../support/results-factory';

// A walk-up has no account: its car is held by the show's creator. Everything the organisers read names the
// person entered at the gate; the walk-up's e-mail stays in the organisers' table and CSV, never on a PDF or public page.
const WALK_UP = { title: 'Gate wagon', entrantName: 'Wendell Gatewood', email: 'wendell.gate@example.test', customs: true };

const pdfText = (pdf: Buffer) => {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'placard-walk-up-')), 'r.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
};
type Organiser = Awaited<ReturnType<typeof judgedShow>>['organiser'];
const pdfOf = async (organiser: Organiser, url: string) => {
  const res = await organiser.client.raw.get(url).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  expect(res.status).toBe(200);
  return pdfText(res.body as Buffer);
};

describe('a walk-up entrant’s own name', () => {
  it('names the walk-up, not the show’s creator, in the entries table, its search and sort, the CSV, the results sheet, the certificates and the read-out; no walk-up e-mail on a PDF or public page', async () => {
    const show = await judgedShow({ hotRods: ['Hiboy'], customs: ['Sled'], walkUps: [WALK_UP] });
    const { organiser, eventId, slug } = show;
    const creatorName = 'Org Anizer';

    const table = await organiser.client.get(`/api/events/${eventId}/entry-table?sort=owner&dir=asc&pageSize=50`);
    expect(table.status).toBe(200);
    const rows = table.body.rows as EntryTableRow[];
    expect(rows.map((r) => [r.buildTitle, r.ownerName])).toEqual([
      ['Hiboy', 'Owen Ownerly'],
      ['Sled', 'Owen Ownerly'],
      ['Gate wagon', 'Wendell Gatewood'],
    ]);
    expect(rows.find((r) => r.buildTitle === 'Gate wagon')!.contact.email).toBe(WALK_UP.email);
    const found = async (q: string) => ((await organiser.client.get(`/api/events/${eventId}/entry-table?q=${encodeURIComponent(q)}`)).body.rows as EntryTableRow[]).map((r) => r.buildTitle);
    expect(await found('Gatewood')).toEqual(['Gate wagon']);
    expect(await found(creatorName)).toEqual([]);
    expect(await found(organiser.email)).toEqual([]);

    const csv = await organiser.client.get(`/api/events/${eventId}/entries.csv`);
    expect(csv.status).toBe(200);
    const walkUpLine = csv.text.split('\n').find((l) => l.includes('Gate wagon'))!;
    expect(walkUpLine).toContain('Wendell Gatewood');
    expect(walkUpLine).toContain(WALK_UP.email);
    expect(csv.text).not.toContain(creatorName);
    expect(csv.text).not.toContain(organiser.email);

    for (const judge of [0, 1]) {
      await show.score(judge, 'Hiboy', [8, 7, 4]);
      await show.score(judge, 'Sled', [6, 6, 3]);
      await show.score(judge, 'Gate wagon', [9, 8, 5]);
    }
    expect((await show.publish()).status).toBe(200);

    const sheet = await pdfOf(organiser, `/api/events/${eventId}/results/sheet.pdf?paper=letter`);
    const certificates = await pdfOf(organiser, `/api/events/${eventId}/results/certificates.pdf?paper=letter`);
    for (const pdf of [sheet, certificates]) {
      expect(pdf).toMatch(/Gate wagon.*Wendell Gatewood/);
      expect(pdf).not.toContain(creatorName);
      expect(pdf).not.toContain(WALK_UP.email);
      expect(pdf).not.toContain(organiser.email);
    }

    const readOut = (await organiser.client.get(`/api/events/${eventId}/results/read-out`)).body.readOut as ReadOut;
    const calls = readOut.sections.flatMap((s) => s.calls).filter((c) => c.title === 'Gate wagon');
    expect(calls.length).toBeGreaterThan(0);
    for (const c of calls) expect(c.owner).toEqual({ name: 'Wendell Gatewood', hometown: null, club: null });

    const page = await request(testApp()).get(`/e/${slug}`);
    const json = await request(testApp()).get(`/api/public/events/${slug}`);
    for (const text of [page.text, JSON.stringify(json.body)]) {
      expect(text).toContain('Gate wagon');
      expect(text).not.toContain(WALK_UP.email);
      expect(text).not.toContain(organiser.email);
    }
  });
});
