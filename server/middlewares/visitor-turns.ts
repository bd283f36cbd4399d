import { createHmac, timingSafeEqual } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import { config } from '../config';
import { SESSION_COOKIE } from '../routes/session';
import { UnavailableError } from '../errors';

/**
 * Visitors take turns; signed-in work does not wait for them.
 *
 * One event loop serves the crowd and the staff. Node reads every socket that is ready in one go, so with
 * hundreds of visitors' requests arriving, each of a judge's database round trips waited for all of them
 * to be answered first. Here a visitor's request (anything but the signed-in API) is queued and started a
 * few per turn of the loop (`setImmediate`), so between turns the loop goes back to its sockets and a
 * judge's query result, or the gate's next request, is handled after at most a few visitors' pages.
 * Visitors lose nothing while the machine has time to spare: the next turn starts at once.
 *
 * "Signed in" is read from the session cookie's signature (express-session's `s:<id>.<HMAC-SHA256>`), so a
 * made-up cookie gets no priority; whether the session is still live is the session middleware's job later.
 */
const waiting: Array<() => void> = [];
let head = 0;
let turnAsked = false;

function takeTurn(): void {
  turnAsked = false;
  const end = Math.min(waiting.length, head + config.visitorRequestsPerTurn);
  while (head < end) {
    const start = waiting[head]!;
    waiting[head++] = undefined as unknown as () => void;
    start();
  }
  if (head === waiting.length) {
    waiting.length = 0;
    head = 0;
  } else askTurn();
}

function askTurn(): void {
  if (turnAsked) return;
  turnAsked = true;
  setImmediate(takeTurn);
}

/** The value of one cookie in a Cookie header, without parsing the others. */
function cookieValue(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  const at = header.indexOf(`${name}=`);
  if (at < 0 || (at > 0 && header[at - 1] !== ' ' && header[at - 1] !== ';')) return undefined;
  const end = header.indexOf(';', at);
  const raw = header.slice(at + name.length + 1, end < 0 ? undefined : end).trim();
  try {
    return decodeURIComponent(raw);
  } catch {
    return undefined;
  }
}

/** Whether the request carries a session cookie this server signed. */
export function carriesSignedSession(req: Request): boolean {
  const value = cookieValue(req.headers.cookie, SESSION_COOKIE);
  if (!value?.startsWith('s:')) return false;
  const dot = value.lastIndexOf('.');
  if (dot < 3) return false;
  const want = Buffer.from(createHmac('sha256', config.sessionSecret).update(value.slice(2, dot)).digest('base64').replace(/=+$/, ''));
  const got = Buffer.from(value.slice(dot + 1));
  return got.length === want.length && timingSafeEqual(got, want);
}

/** The judges' and the gate's own pages: a signed-in person's, which the server draws from their session. */
const STAFF_PAGES = /^\/(?:gate|judge)(?:\/|$)/;

/** Probes (an orchestrator's health and readiness checks), the signed-in API and the staff's pages go first. */
const goesFirst = (req: Request) =>
  req.path === '/api/health' ||
  req.path === '/api/ready' ||
  (((req.path.startsWith('/api/') && !req.path.startsWith('/api/public/')) || STAFF_PAGES.test(req.path)) && carriesSignedSession(req));

/** How many visitors' requests are waiting for their turn now. */
export const visitorsWaiting = () => waiting.length - head;

export function visitorTurns(req: Request, res: Response, next: NextFunction): void {
  if (goesFirst(req)) return next();
  if (visitorsWaiting() >= config.visitorQueueMax) {
    res.set('Retry-After', '5');
    return next(new UnavailableError('Placard is very busy right now. Please try again in a few seconds.'));
  }
  waiting.push(() => next());
  askTurn();
}
