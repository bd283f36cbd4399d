import { expect } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { extractText, getDocumentProxy } from 'unpdf';
import { startCardWorker } from '@server/jobs/card-jobs';
import { confirmEntryPayment } from '@server/services/entries/entries';
import { showWithClasses } from './event-factory';
import { enter, enterAs } from './show-day-factory';
import type { ApiClient } from './api-client';

let worker: Promise<void> | undefined;
/** This test process's card worker (the card queue is per test process: prints are stored in its folder). */
export const cardWorker = () => (worker ??= startCardWorker());

export type ConfirmedEntry = { id: number; number: number; title: string; className: string; code: string; buildId: number };

/**
 * A show with confirmed entries in two classes, plus entries that get no numbered card: one
 * unpaid, one withdrawn. Entries are registered out of class order, so number order mixes classes.
 */
export async function showWithConfirmedEntries(titles: Array<{ title: string; cls: 0 | 1 }>, opts: { showName?: string } = {}) {
  const show = await showWithClasses({ settings: { name: opts.showName ?? 'Riverside Autumn Meet' }, classes: [{ name: 'Hot rods' }, { name: 'Customs' }] });
  const first = await enter(show.eventId, show.classIds[titles[0]!.cls]!, titles[0]!.title);
  await confirmEntryPayment(first.entry.id, `ref-${first.entry.id}`);
  const confirmed: ConfirmedEntry[] = [{ id: first.entry.id, number: first.entry.number!, title: titles[0]!.title, className: titles[0]!.cls ? 'Customs' : 'Hot rods', code: first.owner.build.code, buildId: first.owner.build.id }];
  for (const t of titles.slice(1)) {
    const e = await enterAs(first.owner, show.eventId, show.classIds[t.cls]!, t.title);
    await confirmEntryPayment(e.entry.id, `ref-${e.entry.id}`);
    confirmed.push({ id: e.entry.id, number: e.entry.number!, title: t.title, className: t.cls ? 'Customs' : 'Hot rods', code: e.build.code, buildId: e.build.id });
  }
  const unpaid = await enterAs(first.owner, show.eventId, show.classIds[0]!, 'Unpaid sedan');
  const withdrawn = await enterAs(first.owner, show.eventId, show.classIds[1]!, 'Withdrawn wagon');
  await confirmEntryPayment(withdrawn.entry.id, `ref-${withdrawn.entry.id}`);
  expect((await show.organiser.client.post(`/api/entries/${withdrawn.entry.id}/withdraw`)).status).toBe(200);
  return { ...show, owner: first.owner, confirmed, unpaid: { entryId: unpaid.entry.id }, withdrawn: { entryId: withdrawn.entry.id } };
}

export type PrintBody = { id: number; status: string; done: number; total: number; rendered: number; downloadUrl: string | null; error: string | null };

/** Polls a print until it is finished, keeping every `done` figure seen on the way. */
export async function waitForPrint(client: ApiClient, eventId: number, printId: number, timeoutMs = 120_000): Promise<{ print: PrintBody; seen: number[] }> {
  const seen: number[] = [];
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await client.get(`/api/events/${eventId}/card-prints/${printId}`);
    expect(res.status).toBe(200);
    const print = res.body.print as PrintBody;
    if (seen[seen.length - 1] !== print.done) seen.push(print.done);
    if (print.status === 'done' || print.status === 'failed') return { print, seen };
    if (Date.now() > deadline) throw new Error(`print ${printId} still ${print.status} (${print.done}/${print.total})`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** A binary body through supertest. */
export async function download(client: ApiClient, url: string) {
  return client.get(url).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
}

/** The text of each page, in page order (pdf.js), and the page count pdf-lib reads. */
export async function pagesOf(pdf: Buffer): Promise<{ count: number; texts: string[] }> {
  const count = (await PDFDocument.load(pdf)).getPageCount();
  const { text } = await extractText(await getDocumentProxy(new Uint8Array(pdf)), { mergePages: false });
  return { count, texts: text as string[] };
}

/** The entry number printed under the "ENTRY" label (letter-spaced, so the reader may split its letters). */
export const ENTRY_NUMBER = /E\s?N\s?T\s?R\s?Y\s+(\d{1,4})(?!\d)/;
export const numberOnPage = (text: string) => Number(text.match(ENTRY_NUMBER)?.[1] ?? NaN);
