import { Router } from 'express';
import { z } from 'zod';
import { ClassInputSchema, ClassUpdateSchema, JudgingSheetSchema } from '@shared/schemas/show-classes';
import { EventCreateSchema, EventUpdateSchema, LifecycleActionSchema } from '@shared/schemas/show';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import type { EventAction as LifecycleAction } from '@shared/event-lifecycle';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeEvent } from '../policies/event';
import { loadEventFor } from './load-for';
import { respondWithEvent } from './respond-with-event';
import { createEvent, listEventsOf, listOpenEvents, updateEvent } from '../services/shows/events';
import { takeLifecycleStep } from '../services/commands/take-lifecycle-step';
import { addClass, deleteClass, updateClass } from '../services/shows/event-classes';
import { saveJudgingSheet } from '../services/judging/judging-sheet';
import { listAudit } from '../services/audit/audit';
import { presentAuditLine, presentClass, presentEventSummary } from '../presenters/event';

export const eventsRouter = Router();
eventsRouter.use('/events', requireUser);

const ClassParamsSchema = IdParamSchema.extend({ classId: IdSchema });
const AuditQuerySchema = z.object({ entryId: IdSchema.optional() });

eventsRouter.get('/events', async (req, res) => {
  const rows = await listEventsOf(currentUser(req));
  res.json({ events: rows.map(({ event, roles }) => presentEventSummary(event, roles)) });
});

eventsRouter.get('/events/open', async (_req, res) => {
  const events = await listOpenEvents();
  res.json({ events: events.map((e) => presentEventSummary(e)) });
});

eventsRouter.post('/events', async (req, res) => {
  const input = parseBody(req, EventCreateSchema);
  const user = currentUser(req);
  authorizeEvent(user, 'create');
  const event = await createEvent(user, input);
  await respondWithEvent(req, res, event.id, 201);
});

eventsRouter.get('/events/:id', async (req, res) => {
  const { event } = await loadEventFor(req, 'view');
  await respondWithEvent(req, res, event.id);
});

eventsRouter.patch('/events/:id', async (req, res) => {
  const input = parseBody(req, EventUpdateSchema);
  const { event } = await loadEventFor(req, 'manage');
  await updateEvent(event.id, currentUser(req), input);
  await respondWithEvent(req, res, event.id);
});

eventsRouter.post('/events/:id/lifecycle', async (req, res) => {
  const { action, acknowledgeWarnings } = parseBody(req, LifecycleActionSchema);
  const { event } = await loadEventFor(req, 'manage');
  await takeLifecycleStep(event.id, currentUser(req), action as LifecycleAction, { acknowledgeWarnings });
  await respondWithEvent(req, res, event.id);
});

eventsRouter.post('/events/:id/classes', async (req, res) => {
  const input = parseBody(req, ClassInputSchema);
  const { event } = await loadEventFor(req, 'manage');
  const cls = await addClass(event.id, currentUser(req), input);
  res.status(201).json({ class: presentClass(cls) });
});

eventsRouter.patch('/events/:id/classes/:classId', async (req, res) => {
  const { id, classId } = parseParams(req, ClassParamsSchema);
  const input = parseBody(req, ClassUpdateSchema);
  await loadEventFor(req, 'manage');
  const cls = await updateClass(id, classId, currentUser(req), input);
  res.json({ class: presentClass(cls) });
});

eventsRouter.delete('/events/:id/classes/:classId', async (req, res) => {
  const { id, classId } = parseParams(req, ClassParamsSchema);
  await loadEventFor(req, 'manage');
  await deleteClass(id, classId, currentUser(req));
  res.status(204).end();
});

eventsRouter.put('/events/:id/criteria', async (req, res) => {
  const input = parseBody(req, JudgingSheetSchema);
  const { event } = await loadEventFor(req, 'manage');
  await saveJudgingSheet(event.id, currentUser(req), input);
  await respondWithEvent(req, res, event.id);
});

eventsRouter.get('/events/:id/audit', async (req, res) => {
  const { entryId } = parseQuery(req, AuditQuerySchema);
  const { event } = await loadEventFor(req, 'manage');
  const lines = await listAudit(event.id, entryId);
  res.json({ audit: lines.map(presentAuditLine) });
});
