// Which app addresses the server draws a first screen for: the ones a person opens cold on a weak signal and
// acts on at once (sign-in, the gate, a judge's cars). Everything else gets the opening text until the app arrives.
import type { Request } from 'express';
import type { User } from '../models/user';
import { canEvent, type EventAction } from '../policies/event';
import type { Event } from '../models/event';
import { IdSchema } from '@shared/schemas/params';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent } from '../services/shows/events';
import { logger } from '../logger';
import { NotFoundError } from '../errors';
import { gateScreenHtml } from './gate-screen';
import { judgeScreenHtml } from './judge-screen';
import { loadJudgeView } from '../services/judging/judging';
import { judgingClosedReason } from '../services/judging/scores';
import { presentJudgeView } from '../presenters/judging';
import { signInScreenHtml } from './sign-in-screen';

/** The drawn screen's markup, and whether it is about the person asking (then no shared cache may keep it). */
export type FirstScreen = { html: string; personal: boolean };

/** Sent by the judges' and the gate's service workers (client/public/offline-shell-sw.js): the app is on the phone. */
export const APP_KEPT_HEADER = 'x-placard-worker';

/** A screen about one show for one person: drawn only when the policy allows them `action` there now. */
type ShowScreen = { path: RegExp; action: EventAction; draw: (event: Event, person: User) => string | Promise<string> };

const SIGN_IN = /^\/sign-in$/;
const SHOW_SCREENS: ShowScreen[] = [
  // The gate's box for someone who may check in at this show now.
  { path: /^\/gate\/(\d+)$/, action: 'checkIn', draw: (event) => gateScreenHtml(event.id, event.name) },
  // A judge's cars for a judge of this show while it is judged, from the API's own view of them.
  { path: /^\/judge\/(\d+)$/, action: 'viewOwnSheets', draw: async (event, person) => judgeScreenHtml(presentJudgeView(await loadJudgeView(event.id, person.id), judgingClosedReason(event))) },
];

/** The screen the server draws for this address, or null. Never fails the page: at worst the opening text. */
export async function firstScreenFor(req: Request): Promise<FirstScreen | null> {
  // A phone whose worker keeps the app opens it within a second: a drawing would cost the page time, not save it.
  if (req.get(APP_KEPT_HEADER)) return null;
  if (SIGN_IN.test(req.path)) return { html: signInScreenHtml(), personal: false };
  for (const screen of SHOW_SCREENS) {
    const match = screen.path.exec(req.path);
    if (match) return showScreen(req.user as User | undefined, match[1]!, screen);
  }
  return null;
}

/** Anyone the policy refuses waits for the app's own answer; a missing show is the app's 404; a database away costs only the drawing. */
async function showScreen(person: User | undefined, id: string, screen: ShowScreen): Promise<FirstScreen | null> {
  const eventId = IdSchema.safeParse(id);
  if (!person || !eventId.success) return null;
  try {
    const [event, actor] = await Promise.all([findEvent(eventId.data), actorInEvent(person, eventId.data)]);
    return canEvent(actor, screen.action, event) ? { html: await screen.draw(event, person), personal: true } : null;
  } catch (err) {
    if (!(err instanceof NotFoundError)) logger.warn({ err }, `${screen.path.source}: the page is sent without its first screen`);
    return null;
  }
}

/** The routes that read the session before the page is drawn (the others need no one's session). */
export const FIRST_SCREENS_FOR_SOMEONE = ['/gate/:id', '/judge/:id'];
