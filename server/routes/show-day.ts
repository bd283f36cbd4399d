import { Router } from 'express';
import { IdParamSchema } from '@shared/schemas/params';
import { ChangeClassSchema, EntryExportQuerySchema, EntryTableQuerySchema, GateCheckInSchema, GateLookupQuerySchema, GateUndoSchema, MarkPaidSchema } from '@shared/schemas/show-day';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeEntry } from '../policies/event';
import { actorInEvent } from '../services/shows/event-actor';
import { findEntry } from '../services/entries/entries';
import { listAudit } from '../services/audit/audit';
import { listEntriesForExport, listEntryTable } from '../services/entries/entry-table';
import { entriesCsv } from '../services/entries/entry-export';
import { changeEntryClass, markEntryPaid, moveUpFromWaitingList } from '../services/entries/entry-actions';
import { gateCheckIn, gateCounts, gateLookup, undoCheckIn } from '../services/show-day/gate';
import { presentEntryTableRow } from '../presenters/entry-table';
import { presentAuditLine } from '../presenters/event';
import { authorizedEvent } from './events';

/** Show day: the organiser's entries table and its actions, the CSV export, and the gate. */
export const showDayRouter = Router();

showDayRouter.get('/events/:id/entry-table', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const query = parseQuery(req, EntryTableQuerySchema);
  await authorizedEvent(req, id, 'viewEntries');
  const { rows, total, places } = await listEntryTable(id, query);
  res.json({ rows: rows.map((r) => presentEntryTableRow(r, places)), total, page: query.page, pageSize: query.pageSize, pageCount: Math.max(1, Math.ceil(total / query.pageSize)) });
});

showDayRouter.get('/events/:id/entries.csv', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const query = parseQuery(req, EntryExportQuerySchema);
  const { event } = await authorizedEvent(req, id, 'viewEntries');
  const { rows, places } = await listEntriesForExport(id, query);
  res.set('Content-Type', 'text/csv; charset=utf-8');
  res.set('Content-Disposition', `attachment; filename="${event.slug}-entries.csv"`);
  res.set('Cache-Control', 'private, no-store');
  res.send(entriesCsv(rows.map((r) => presentEntryTableRow(r, places))));
});

/** Loads the entry and checks that the person organises its show. */
async function managedEntry(req: import('express').Request, id: number) {
  const entry = await findEntry(id);
  authorizeEntry(await actorInEvent(currentUser(req), entry.eventId), 'manage', entry);
  return entry;
}

async function respondWithRow(res: import('express').Response, eventId: number, entryId: number) {
  const { rows, places } = await listEntriesForExport(eventId, { sort: 'number', dir: 'asc' });
  const row = rows.find((r) => r.id === entryId)!;
  const lines = await listAudit(eventId, entryId);
  res.json({ entry: presentEntryTableRow(row, places), audit: lines.map(presentAuditLine) });
}

showDayRouter.post('/entries/:id/class', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { classId } = parseBody(req, ChangeClassSchema);
  const entry = await managedEntry(req, id);
  await changeEntryClass(id, classId, currentUser(req));
  await respondWithRow(res, entry.eventId, id);
});

showDayRouter.post('/entries/:id/mark-paid', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { note } = parseBody(req, MarkPaidSchema);
  const entry = await managedEntry(req, id);
  await markEntryPaid(id, note, currentUser(req));
  await respondWithRow(res, entry.eventId, id);
});

showDayRouter.post('/entries/:id/move-up', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const entry = await managedEntry(req, id);
  await moveUpFromWaitingList(id, currentUser(req));
  await respondWithRow(res, entry.eventId, id);
});

/** One entry's history for the organiser (who, when, before → after). */
showDayRouter.get('/entries/:id/audit', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const entry = await managedEntry(req, id);
  const lines = await listAudit(entry.eventId, id);
  res.json({ audit: lines.map(presentAuditLine) });
});

// ---- The gate: gate staff and organisers, on show day ----

showDayRouter.get('/events/:id/gate/lookup', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const query = parseQuery(req, GateLookupQuerySchema);
  const { event } = await authorizedEvent(req, id, 'checkIn');
  res.json({ card: await gateLookup(event, query) });
});

showDayRouter.post('/events/:id/gate/check-in', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { number, takeCash } = parseBody(req, GateCheckInSchema);
  const { event } = await authorizedEvent(req, id, 'checkIn');
  res.json({ card: await gateCheckIn(event, number, takeCash, currentUser(req)) });
});

showDayRouter.post('/events/:id/gate/undo', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { entryId } = parseBody(req, GateUndoSchema);
  const { event } = await authorizedEvent(req, id, 'checkIn');
  res.json({ card: await undoCheckIn(event, entryId, currentUser(req)) });
});

showDayRouter.get('/events/:id/gate/counts', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  await authorizedEvent(req, id, 'checkIn');
  res.json(await gateCounts(id));
});
