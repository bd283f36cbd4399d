import type { Transaction, WhereOptions } from 'sequelize';
import { createHash, randomUUID } from 'node:crypto';
import os from 'node:os';
import { Op } from 'sequelize';
import { PDFDocument } from 'pdf-lib';
import { CARD_PRINT_ACTIVE, CARD_PRINT_ENTRY_STATUSES, printStalled } from '@shared/schemas/card-print';
import { config } from '../../config';
import { withTransaction } from '../../db/transaction';
import { logger } from '../../logger';
import { CardPrint } from '../../models/card-print';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { CARD_QUEUE, jobQueue } from '../../jobs/queue';
import { storage, type StoredObject } from '../../storage/index';
import { cardCacheKey, cardSetKey } from '../../storage/keys';
import { numberedCardsOf, readStoredFile, renderNumberedCards, type NumberedCard } from './numbered-cards';

/** The job that renders a print; the card queue also carries show reminders (`jobs/card-jobs.ts`). */
export type CardPrintJob = { kind: 'print'; printId: number };

/**
 * A running print beats this often (every 5 s, or a third of the stale threshold if that is shorter); one
 * silent for CARD_PRINT_STALE_SECONDS (config) lost its worker and is taken over (`requeueStalePrints`).
 */
export const cardPrintHeartbeatMs = () => Math.min(5_000, (config.cardPrintStaleSeconds * 1000) / 3);
const isStalled = (print: CardPrint) => printStalled(print.status, print.heartbeatAt, config.cardPrintStaleSeconds);
const staleBefore = () => new Date(Date.now() - config.cardPrintStaleSeconds * 1000);
/** This worker process, as a print it holds names it. */
const thisWorker = `${os.hostname()}:${process.pid}`.slice(0, 120);

/** Thrown inside a run that lost its hold on the print (another worker took it over): it stops writing. */
class PrintTakenOver extends Error {}
/** Thrown inside a run whose process is stopping: the print goes back to the queue, to resume elsewhere. */
class PrintHandedBack extends Error {}

/**
 * Puts prints back on the card queue, each with a new job, in one transaction (both or neither): status
 * queued, no holder. The cards drawn so far are cached, so the next run resumes where this one stopped,
 * and nothing is served until the whole file is stored. Returns the ids put back.
 */
async function requeuePrints(where: WhereOptions<CardPrint>, outer?: Transaction): Promise<number[]> {
  const queue = jobQueue();
  await queue.prepareCardQueue(); // before the transaction (see startCardPrint)
  return withTransaction(outer, async (transaction) => {
    const [, rows] = await CardPrint.update({ status: 'queued', workerToken: null, heldBy: null, heartbeatAt: null, queue: CARD_QUEUE }, { where, returning: true, transaction });
    for (const row of rows) await queue.send(CARD_QUEUE, { kind: 'print', printId: row.id } satisfies CardPrintJob, transaction);
    return rows.map((row) => row.id);
  });
}

/**
 * The sweep of a card worker: running prints of its queue whose worker stopped beating (killed, lost
 * with its machine) go back on the queue at once, and a live worker resumes them. The update takes each
 * row once, so sweeps of several workers never queue a print twice.
 */
export async function requeueStalePrints(): Promise<number[]> {
  const ids = await requeuePrints({ status: 'running', queue: CARD_QUEUE, [Op.or]: [{ heartbeatAt: null }, { heartbeatAt: { [Op.lt]: staleBefore() } }] });
  if (ids.length) logger.warn({ printIds: ids }, 'card prints whose worker stopped are back on the queue');
  return ids;
}

const withPeople = [
  { model: User, as: 'starter', attributes: ['id', 'name'] },
  { model: EventClass, as: 'eventClass', attributes: ['id', 'name'] },
];

async function classOfShow(eventId: number, classId: number) {
  const cls = await EventClass.findOne({ where: { id: classId, eventId }, attributes: ['id'] });
  if (!cls) throw new ValidationError({ classId: 'Not a class of this show.' });
}

const confirmedWhere = (eventId: number, classId: number | null) => ({
  eventId,
  status: { [Op.in]: [...CARD_PRINT_ENTRY_STATUSES] },
  number: { [Op.ne]: null },
  ...(classId ? { classId } : {}),
});

/**
 * Starts a bulk print of numbered cards for every confirmed entry of the show (or one class). While
 * one runs for the same show and filter, that one is returned instead of a second. A show (or class)
 * with no confirmed entries is refused with the reason rather than producing an empty file.
 */
export async function startCardPrint(event: Event, classId: number | null, person: { id: number }, outer?: Transaction): Promise<{ print: CardPrint; created: boolean }> {
  if (classId) await classOfShow(event.id, classId);
  const queue = jobQueue();
  await queue.prepareCardQueue(); // before the transaction: the first start makes pg-boss's tables, and the card queue, on its own connection
  const { id, created } = await withTransaction(outer, async (transaction) => {
    // Two organisers starting at once take turns here, so the second finds the first one's print.
    await Event.findByPk(event.id, { lock: transaction.LOCK.UPDATE, transaction });
    const running = await CardPrint.findOne({ where: { eventId: event.id, classId, status: { [Op.in]: [...CARD_PRINT_ACTIVE] } }, transaction });
    if (running && !isStalled(running)) return { id: running.id, created: false };
    if (running) {
      // Its worker died mid-print and no sweep has put it back yet: queue it again now.
      await requeuePrints({ id: running.id, status: 'running' }, transaction);
      return { id: running.id, created: true };
    }
    const total = await Entry.count({ where: confirmedWhere(event.id, classId), transaction });
    if (total === 0) {
      throw new ConflictError(classId ? 'This class has no confirmed entries yet: there are no cards to print.' : 'This show has no confirmed entries yet: there are no cards to print.', { classId: 'No confirmed entries.' });
    }
    const print = await CardPrint.create({ eventId: event.id, classId, total, startedBy: person.id, queue: CARD_QUEUE }, { transaction });
    const job: CardPrintJob = { kind: 'print', printId: print.id };
    await queue.send(CARD_QUEUE, job, transaction);
    return { id: print.id, created: true };
  });
  return { print: (await CardPrint.findByPk(id, { include: withPeople }))!, created };
}

/** One print of this show. */
export async function findCardPrint(eventId: number, printId: number): Promise<CardPrint> {
  const print = await CardPrint.findOne({ where: { id: printId, eventId }, include: withPeople });
  if (!print) throw new NotFoundError('No such print for this show.');
  return print;
}

/** The newest print of this show for the filter (every class, or one), running or not: what a reload or a second organiser sees. */
export async function latestCardPrint(eventId: number, classId: number | null): Promise<CardPrint | null> {
  return CardPrint.findOne({ where: { eventId, classId }, include: withPeople, order: [['id', 'DESC']] });
}

/** The finished PDF, or a 409 while it is not ready. */
export async function cardPrintFile(print: CardPrint): Promise<StoredObject> {
  if (print.status !== 'done' || !print.fileKey) throw new ConflictError('The cards are not ready yet.', { status: print.status });
  const file = await storage.get(print.fileKey);
  if (!file) throw new NotFoundError('The printed file is gone; start the print again.');
  return file;
}

/** Splits a document into one-page documents, in order (the cache keeps each card on its own). */
async function splitPages(pdf: Buffer): Promise<Buffer[]> {
  const src = await PDFDocument.load(pdf);
  const out: Buffer[] = [];
  for (let i = 0; i < src.getPageCount(); i++) {
    const one = await PDFDocument.create();
    const [page] = await one.copyPages(src, [i]);
    one.addPage(page!);
    out.push(Buffer.from(await one.save()));
  }
  return out;
}

/** Concatenates one-page PDFs with pdf-lib: pages are copied, never drawn again. */
async function joinPages(pdfs: Buffer[], title: string): Promise<Buffer> {
  const out = await PDFDocument.create();
  out.setTitle(title);
  out.setProducer('Placard');
  out.setCreator('Placard');
  for (const pdf of pdfs) {
    const src = await PDFDocument.load(pdf);
    for (const page of await out.copyPages(src, src.getPageIndices())) out.addPage(page);
  }
  return Buffer.from(await out.save());
}

/**
 * Renders a print: each card's page comes from the cache when its content and design are unchanged,
 * the rest are drawn (a batch to a document) and cached; the pages are joined in number order. The
 * whole set is cached too, by the list of its cards: an unchanged re-print reuses the finished file.
 * Progress (done / total) is written as it goes, for the organiser's progress bar. When `handBack`
 * aborts (the worker is stopping), the print goes back to the queue after the batch being drawn.
 */
export async function runCardPrint(printId: number, handBack?: AbortSignal): Promise<void> {
  const token = randomUUID();
  // Take the print: queued, or running with a silent worker. A print another live run holds is left alone.
  const [, claimed] = await CardPrint.update(
    { status: 'running', workerToken: token, heldBy: thisWorker, heartbeatAt: new Date() },
    { where: { id: printId, [Op.or]: [{ status: 'queued' }, { status: 'running', heartbeatAt: { [Op.or]: [null, { [Op.lt]: staleBefore() }] } }] }, returning: true },
  );
  const print = claimed[0];
  if (!print) return;
  // Writes only while this run still holds the print.
  const write = async (values: Partial<CardPrint>) => {
    const [n] = await CardPrint.update({ ...values, heartbeatAt: new Date() }, { where: { id: printId, workerToken: token } });
    if (n === 0) throw new PrintTakenOver();
  };
  const checkpoint = () => {
    if (handBack?.aborted) throw new PrintHandedBack();
  };
  const beat = setInterval(() => void write({}).catch(() => undefined), cardPrintHeartbeatMs());
  try {
    await renderPrint(print, write, checkpoint);
  } catch (err) {
    if (err instanceof PrintTakenOver) return;
    if (err instanceof PrintHandedBack) {
      clearInterval(beat);
      const back = await requeuePrints({ id: printId, workerToken: token });
      logger.warn({ printId, handedBack: back.length > 0 }, 'stopping: the card print in hand is back on the queue');
      return;
    }
    logger.error({ err, printId }, 'card print failed');
    const message = err instanceof Error ? err.message.slice(0, 480) : 'The print failed.';
    await write({ status: 'failed', error: message, finishedAt: new Date() }).catch(() => undefined);
  } finally {
    clearInterval(beat);
  }
}

async function renderPrint(print: CardPrint, write: (values: Partial<CardPrint>) => Promise<void>, checkpoint: () => void): Promise<void> {
  const event = (await Event.findByPk(print.eventId, { attributes: ['id', 'name', 'slug'] }))!;
  const cards = await numberedCardsOf(event, print.classId);
  if (cards.length === 0) throw new Error('No confirmed entries are left to print.');
  await write({ total: cards.length, done: 0, rendered: 0, error: null });
  const setKey = cardSetKey(createHash('sha256').update(cards.map((c) => c.hash).join('\n')).digest('hex'));
  if (await storage.exists(setKey)) {
    await write({ status: 'done', done: cards.length, fileKey: setKey, finishedAt: new Date() });
    return;
  }
  const pages: Array<Buffer | null> = await Promise.all(cards.map((c) => readStoredFile(cardCacheKey(c.hash))));
  const missing = cards.map((c, i) => ({ card: c, i })).filter(({ i }) => !pages[i]);
  let done = cards.length - missing.length;
  let rendered = 0;
  await write({ done });
  // Cards missing from the cache are drawn CARD_RENDER_BATCH (20) to a document, much quicker than one by one,
  // then split into pages; each batch is cached and counted before the next, so a run taken over loses one batch at most.
  const perBatch = config.cardRenderBatch;
  for (let at = 0; at < missing.length; at += perBatch) {
    checkpoint();
    const batch = missing.slice(at, at + perBatch);
    const drawn = await splitPages(await renderNumberedCards(batch.map((m) => m.card.content), event.name));
    await Promise.all(batch.map(({ card, i }, n) => {
      pages[i] = drawn[n]!;
      return storage.put(cardCacheKey(card.hash), drawn[n]!, 'application/pdf');
    }));
    done += batch.length;
    rendered += batch.length;
    await write({ done, rendered });
  }
  const joined = await joinPages(pages as Buffer[], `${event.name}: numbered cards`);
  // The file is stored whole under its final key (the local disk writes a temporary file and renames it;
  // S3 makes an object visible only once complete), and the print is marked done only after that: the
  // download route serves nothing before.
  await storage.put(setKey, joined, 'application/pdf');
  await write({ status: 'done', fileKey: setKey, finishedAt: new Date() });
}

export type { NumberedCard };
