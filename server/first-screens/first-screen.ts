// Which app addresses the server draws a first screen for: the ones a person opens cold on a weak signal and
// acts on at once (the gate, sign-in). Everything else gets the opening text until the app arrives.
import type { Request } from 'express';
import type { User } from '../models/user';
import { canEvent } from '../policies/event';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent } from '../services/shows/events';
import { logger } from '../logger';
import { NotFoundError } from '../errors';
import { gateScreenHtml } from './gate-screen';
import { signInScreenHtml } from './sign-in-screen';

/** The drawn screen's markup, and whether it is about the person asking (then no shared cache may keep it). */
export type FirstScreen = { html: string; personal: boolean };

const SIGN_IN = /^\/sign-in$/;
const GATE = /^\/gate\/(\d{1,15})$/;

/** The screen the server draws for this address, or null. Never fails the page: at worst the opening text. */
export async function firstScreenFor(req: Request): Promise<FirstScreen | null> {
  if (SIGN_IN.test(req.path)) return { html: signInScreenHtml(), personal: false };
  const gate = GATE.exec(req.path);
  if (gate) return gateScreen(req.user as User | undefined, Number(gate[1]));
  return null;
}

/** The gate's box only for someone who may check in at this show now; anyone else waits for the app's answer. */
async function gateScreen(person: User | undefined, eventId: number): Promise<FirstScreen | null> {
  if (!person || !Number.isSafeInteger(eventId)) return null;
  try {
    const [event, actor] = await Promise.all([findEvent(eventId), actorInEvent(person, eventId)]);
    return canEvent(actor, 'checkIn', event) ? { html: gateScreenHtml(event.id, event.name), personal: true } : null;
  } catch (err) {
    // A missing show answers 404 in the app; a database away for a moment costs only the drawn screen.
    if (!(err instanceof NotFoundError)) logger.warn({ err }, 'the gate page is sent without its first screen');
    return null;
  }
}

/** The routes that read the session before the page is drawn (the others need no one's session). */
export const FIRST_SCREENS_FOR_SOMEONE = ['/gate/:id'];
