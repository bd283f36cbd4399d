import { Router } from 'express';
import { ChangeClassSchema, EntryExportQuerySchema, EntryTableQuerySchema, GateCardParamsSchema, GateCheckInSchema, GateLookupQuerySchema, GateSyncSchema, GateUndoSchema, MarkPaidSchema, WalkUpSchema } from '@shared/schemas/show-day';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { cardRenderLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { listAudit, manualPaymentNotes } from '../services/audit/audit';
import { listEntriesForExport, listEntryTable } from '../services/entries/entry-table';
import { entriesCsv } from '../services/entries/entry-export';
import { moneyTotals } from '../services/entries/money-totals';
import { changeEntryClass, markEntryPaid, moveUpFromWaitingList } from '../services/entries/entry-actions';
import { gateCheckIn, gateCounts, gateLookup, undoCheckIn } from '../services/show-day/gate';
import { applyQueuedCheckIns, gateRoster } from '../services/show-day/gate-offline';
import { cachedNumberedCard, numberedCardsOf } from '../services/show-day/numbered-cards';
import { enterWalkUp } from '../services/entries/walk-ups';
import { NotFoundError } from '../errors';
import { presentEntryTableRow, presentMoneyTotals } from '../presenters/entry-table';
import type { Actor } from '../policies/actor';
import { presentGateCard, presentGateCounts, presentGateRoster, presentGateSyncResult } from '../presenters/gate';
import { presentAuditLine } from '../presenters/event';
import { loadEntryFor, loadEventFor } from './load-for';
import { sendCompressedJson } from '../middlewares/send-compressed';

/** Show day: the organiser's entries table and its actions, the CSV export, and the gate. */
export const showDayRouter = Router();

showDayRouter.get('/events/:id/entry-table', requireUser, async (req, res) => {
  const query = parseQuery(req, EntryTableQuerySchema);
  const { event, actor } = await loadEventFor(req, 'viewEntries');
  const { rows, total, places } = await listEntryTable(event.id, query);
  res.json({ rows: rows.map((r) => presentEntryTableRow(r, places, actor)), total, page: query.page, pageSize: query.pageSize, pageCount: Math.max(1, Math.ceil(total / query.pageSize)) });
});

/** Money at a glance: collected, refunded and due, by how it was paid. */
showDayRouter.get('/events/:id/money', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'viewEntries');
  res.set('Cache-Control', 'private, no-store').json({ money: presentMoneyTotals(await moneyTotals(event.id, event.currency)) });
});

showDayRouter.get('/events/:id/entries.csv', requireUser, async (req, res) => {
  const query = parseQuery(req, EntryExportQuerySchema);
  const { event, actor } = await loadEventFor(req, 'viewEntries');
  const { rows, places } = await listEntriesForExport(event.id, query);
  res.set('Content-Type', 'text/csv; charset=utf-8');
  res.set('Content-Disposition', `attachment; filename="${event.slug}-entries.csv"`);
  res.set('Cache-Control', 'private, no-store');
  res.send(entriesCsv(rows.map((r) => presentEntryTableRow(r, places, actor)), { timeZone: event.timeZone, paymentNotes: await manualPaymentNotes(event.id) }));
});

async function respondWithRow(res: import('express').Response, actor: Actor, eventId: number, entryId: number) {
  const { rows, places } = await listEntriesForExport(eventId, { sort: 'number', dir: 'asc' });
  const row = rows.find((r) => r.id === entryId)!;
  const lines = await listAudit(eventId, entryId);
  res.json({ entry: presentEntryTableRow(row, places, actor), audit: lines.map(presentAuditLine) });
}

showDayRouter.post('/entries/:id/class', requireUser, async (req, res) => {
  const { classId } = parseBody(req, ChangeClassSchema);
  const { entry, actor } = await loadEntryFor(req, 'manage');
  await changeEntryClass(entry.id, classId, currentUser(req));
  await respondWithRow(res, actor, entry.eventId, entry.id);
});

showDayRouter.post('/entries/:id/mark-paid', requireUser, async (req, res) => {
  const { note } = parseBody(req, MarkPaidSchema);
  const { entry, actor } = await loadEntryFor(req, 'manage');
  await markEntryPaid(entry.id, note, currentUser(req));
  await respondWithRow(res, actor, entry.eventId, entry.id);
});

showDayRouter.post('/entries/:id/move-up', requireUser, async (req, res) => {
  const { entry, actor } = await loadEntryFor(req, 'manage');
  await moveUpFromWaitingList(entry.id, currentUser(req));
  await respondWithRow(res, actor, entry.eventId, entry.id);
});

/** One entry's history for the organiser (who, when, before → after). */
showDayRouter.get('/entries/:id/audit', requireUser, async (req, res) => {
  const { entry } = await loadEntryFor(req, 'manage');
  const lines = await listAudit(entry.eventId, entry.id);
  res.json({ audit: lines.map(presentAuditLine) });
});

// ---- The gate: gate staff and organisers, on show day ----

showDayRouter.get('/events/:id/gate/lookup', requireUser, async (req, res) => {
  const query = parseQuery(req, GateLookupQuerySchema);
  const { event } = await loadEventFor(req, 'checkIn');
  res.json({ card: presentGateCard(await gateLookup(event, query), event) });
});

showDayRouter.post('/events/:id/gate/check-in', requireUser, async (req, res) => {
  const { number, takeCash } = parseBody(req, GateCheckInSchema);
  const { event } = await loadEventFor(req, 'checkIn');
  res.json({ card: presentGateCard(await gateCheckIn(event, number, takeCash, currentUser(req)), event) });
});

showDayRouter.post('/events/:id/gate/undo', requireUser, async (req, res) => {
  const { entryId } = parseBody(req, GateUndoSchema);
  const { event } = await loadEventFor(req, 'checkIn');
  res.json({ card: presentGateCard(await undoCheckIn(event, entryId, currentUser(req)), event) });
});

showDayRouter.get('/events/:id/gate/counts', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'checkIn');
  res.json(presentGateCounts(await gateCounts(event.id)));
});

/** The show's entries as the gate's phone keeps them, for checking in with no signal. */
showDayRouter.get('/events/:id/gate/roster', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'checkIn');
  res.set('Cache-Control', 'private, no-store');
  sendCompressedJson(req, res, presentGateRoster(event, true, await gateRoster(event.id), new Date()));
});

/** Check-ins a phone queued with no signal: each applied once (by its id), each answered. */
showDayRouter.post('/events/:id/gate/sync', requireUser, async (req, res) => {
  const { deviceId, checkIns } = parseBody(req, GateSyncSchema);
  const { event } = await loadEventFor(req, 'checkIn');
  const applied = await applyQueuedCheckIns(event, deviceId, checkIns, currentUser(req));
  res.json({ results: applied.map((a) => presentGateSyncResult(a, event)) });
});

/** A walk-up: entered, numbered, paid in cash and checked in at the gate. */
showDayRouter.post('/events/:id/gate/walk-ups', requireUser, async (req, res) => {
  const input = parseBody(req, WalkUpSchema);
  const { event } = await loadEventFor(req, 'checkIn');
  const entry = await enterWalkUp(event.id, input, currentUser(req));
  res.status(201).json({ card: presentGateCard(await gateLookup(event, { number: entry.number! }), event) });
});

/** One entry's numbered card, to print at the gate (a walk-up's, or a replacement). */
showDayRouter.get('/events/:id/gate/cards/:number', requireUser, cardRenderLimiter, async (req, res) => {
  const { number } = parseParams(req, GateCardParamsSchema);
  const { event } = await loadEventFor(req, 'checkIn');
  const found = await gateLookup(event, { number });
  const [card] = found.entry ? await numberedCardsOf(event, null, found.entry.id) : [];
  if (!card) throw new NotFoundError(`Entry ${number} has no card yet: it needs a place and its fee paid.`);
  const { pdf } = await cachedNumberedCard(card);
  res.type('application/pdf').set('Content-Disposition', `inline; filename="${event.slug}-entry-${number}.pdf"`).set('Cache-Control', 'private, no-store').send(pdf);
});
