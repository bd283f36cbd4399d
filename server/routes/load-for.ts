import type { Request } from 'express';
import { IdParamSchema } from '@shared/schemas/params';
import { parseParams } from '../middlewares/validate';
import { currentUser } from '../middlewares/authenticate';
import { authorizeEvent, type EventAction } from '../policies/event';
import { authorizeEntry, type EntryAction } from '../policies/entry';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent } from '../services/shows/events';
import { findEntry } from '../services/entries/entries';

/**
 * The one way a show-side route loads its show: the show named by `:id` (404 if missing), the person as an actor
 * with their roles in this show, and the policy's answer for this action (401, 404 or 403).
 */
export async function loadEventFor(req: Request, action: EventAction) {
  const { id } = parseParams(req, IdParamSchema);
  // The show and the person's roles in it are asked at once (one round trip, not two: a judge's or the gate's
  // wait on a busy morning); a missing show still answers 404 before anything about the person.
  const [event, actor] = await Promise.allSettled([findEvent(id), (async () => actorInEvent(currentUser(req), id))()]);
  if (event.status === 'rejected') throw event.reason;
  if (actor.status === 'rejected') throw actor.reason;
  authorizeEvent(actor.value, action, event.value);
  return { event: event.value, actor: actor.value! };
}

/** The person as an actor with their roles in this show as they are now (after a change: a new show's creator is its organiser). */
export const actorFor = (req: Request, eventId: number) => actorInEvent(currentUser(req), eventId);

/** The same for a route about one entry (`:id`): the entry, the actor in its show, the entry policy's answer. */
export async function loadEntryFor(req: Request, action: EntryAction) {
  const entry = await findEntry(parseParams(req, IdParamSchema).id);
  const actor = await actorInEvent(currentUser(req), entry.eventId);
  authorizeEntry(actor, action, entry);
  return { entry, actor: actor! };
}
