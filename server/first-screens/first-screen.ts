// Which app addresses the server draws a first screen for: the ones a person opens cold on a weak signal and
// acts on at once (sign-in, the gate, a judge's cars). Everything else gets the opening text until the app arrives.
import type { Request } from 'express';
import type { User } from '../models/user';
import { canEvent } from '../policies/event';
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

const SIGN_IN = /^\/sign-in$/;
const GATE = /^\/gate\/(\d{1,15})$/;
const JUDGE_CARS = /^\/judge\/(\d{1,15})$/;

/** Sent by the judges' and the gate's service workers (client/public/offline-shell-sw.js): the app is on the phone. */
export const APP_KEPT_HEADER = 'x-placard-worker';

/** The screen the server draws for this address, or null. Never fails the page: at worst the opening text. */
export async function firstScreenFor(req: Request): Promise<FirstScreen | null> {
  // A phone whose worker keeps the app opens it within a second: a drawing would cost the page time, not save it.
  if (req.get(APP_KEPT_HEADER)) return null;
  if (SIGN_IN.test(req.path)) return { html: signInScreenHtml(), personal: false };
  const gate = GATE.exec(req.path);
  if (gate) return gateScreen(req.user as User | undefined, Number(gate[1]));
  const judge = JUDGE_CARS.exec(req.path);
  if (judge) return judgeScreen(req.user as User | undefined, Number(judge[1]));
  return null;
}

/** The gate's box only for someone who may check in at this show now; anyone else waits for the app's answer. */
async function gateScreen(person: User | undefined, eventId: number): Promise<FirstScreen | null> {
  if (!person || !Number.isSafeInteger(eventId)) return null;
  return drawn('gate', async () => {
    const [event, actor] = await Promise.all([findEvent(eventId), actorInEvent(person, eventId)]);
    return canEvent(actor, 'checkIn', event) ? gateScreenHtml(event.id, event.name) : null;
  });
}

/** A judge's cars only for a judge of this show while it is judged (the app's own answer for everyone else). */
async function judgeScreen(person: User | undefined, eventId: number): Promise<FirstScreen | null> {
  if (!person || !Number.isSafeInteger(eventId)) return null;
  return drawn('judge', async () => {
    const [event, actor] = await Promise.all([findEvent(eventId), actorInEvent(person, eventId)]);
    if (!canEvent(actor, 'viewOwnSheets', event)) return null;
    return judgeScreenHtml(presentJudgeView(await loadJudgeView(event.id, person.id), judgingClosedReason(event)));
  });
}

/** A personal drawn screen, or none: a missing show answers 404 in the app; a database away costs only the drawing. */
async function drawn(what: string, draw: () => Promise<string | null>): Promise<FirstScreen | null> {
  try {
    const html = await draw();
    return html === null ? null : { html, personal: true };
  } catch (err) {
    if (!(err instanceof NotFoundError)) logger.warn({ err }, `the ${what} page is sent without its first screen`);
    return null;
  }
}

/** The routes that read the session before the page is drawn (the others need no one's session). */
export const FIRST_SCREENS_FOR_SOMEONE = ['/gate/:id', '/judge/:id'];
