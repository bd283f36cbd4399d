import { Router, type Request } from 'express';
import { z } from 'zod';
import { ClassInputSchema, ClassUpdateSchema, JudgingSheetSchema } from '@shared/schemas/show-classes';
import { EventCreateSchema, EventUpdateSchema, LifecycleActionSchema } from '@shared/schemas/show';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import type { EventAction as LifecycleAction } from '@shared/event-lifecycle';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeEvent, type EventAction } from '../policies/event';
import { actorInEvent } from '../services/shows/event-actor';
import { createEvent, findEvent, listEventsOf, listOpenEvents, loadEventDetail, updateEvent } from '../services/shows/events';
import { takeLifecycleStep } from '../services/commands/take-lifecycle-step';
import { addClass, deleteClass, updateClass } from '../services/shows/event-classes';
import { saveJudgingSheet } from '../services/judging/judging-sheet';
import { listAudit } from '../services/audit/audit';
import { presentAuditLine, presentClass, presentEvent, presentEventSummary } from '../presenters/event';

export const eventsRouter = Router();
eventsRouter.use('/events', requireUser);

const ClassParamsSchema = IdParamSchema.extend({ classId: IdSchema });
const AuditQuerySchema = z.object({ entryId: IdSchema.optional() });

/** Loads the show, makes the person an actor with their roles in it, and checks the policy. */
export async function authorizedEvent(req: Request, id: number, action: EventAction) {
  const event = await findEvent(id);
  const actor = await actorInEvent(currentUser(req), event.id);
  authorizeEvent(actor, action, event);
  return { event, actor };
}

export async function respondWithEvent(req: Request, res: import('express').Response, id: number, status = 200) {
  const event = await loadEventDetail(id);
  const actor = await actorInEvent(currentUser(req), id);
  res.status(status).json({ event: presentEvent(event, actor) });
}

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
  const { id } = parseParams(req, IdParamSchema);
  await authorizedEvent(req, id, 'view');
  await respondWithEvent(req, res, id);
});

eventsRouter.patch('/events/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, EventUpdateSchema);
  await authorizedEvent(req, id, 'manage');
  await updateEvent(id, currentUser(req), input);
  await respondWithEvent(req, res, id);
});

eventsRouter.post('/events/:id/lifecycle', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { action } = parseBody(req, LifecycleActionSchema);
  await authorizedEvent(req, id, 'manage');
  await takeLifecycleStep(id, currentUser(req), action as LifecycleAction);
  await respondWithEvent(req, res, id);
});

eventsRouter.post('/events/:id/classes', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, ClassInputSchema);
  await authorizedEvent(req, id, 'manage');
  const cls = await addClass(id, currentUser(req), input);
  res.status(201).json({ class: presentClass(cls) });
});

eventsRouter.patch('/events/:id/classes/:classId', async (req, res) => {
  const { id, classId } = parseParams(req, ClassParamsSchema);
  const input = parseBody(req, ClassUpdateSchema);
  await authorizedEvent(req, id, 'manage');
  const cls = await updateClass(id, classId, currentUser(req), input);
  res.json({ class: presentClass(cls) });
});

eventsRouter.delete('/events/:id/classes/:classId', async (req, res) => {
  const { id, classId } = parseParams(req, ClassParamsSchema);
  await authorizedEvent(req, id, 'manage');
  await deleteClass(id, classId, currentUser(req));
  res.status(204).end();
});

eventsRouter.put('/events/:id/criteria', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, JudgingSheetSchema);
  await authorizedEvent(req, id, 'manage');
  await saveJudgingSheet(id, currentUser(req), input);
  await respondWithEvent(req, res, id);
});

eventsRouter.get('/events/:id/audit', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { entryId } = parseQuery(req, AuditQuerySchema);
  await authorizedEvent(req, id, 'manage');
  const lines = await listAudit(id, entryId);
  res.json({ audit: lines.map(presentAuditLine) });
});
