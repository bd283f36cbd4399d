import type { Request, Response } from 'express';
import { actorFor } from './load-for';
import { loadEventDetail } from '../services/shows/events';
import { presentEvent } from '../presenters/event';

/** After any change, the organiser's routes answer with the whole show as its screens show it. */
export async function respondWithEvent(req: Request, res: Response, id: number, status = 200): Promise<void> {
  const event = await loadEventDetail(id);
  const actor = await actorFor(req, id);
  res.status(status).json({ event: presentEvent(event, actor) });
}
