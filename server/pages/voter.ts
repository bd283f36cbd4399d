import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import cookieParser from 'cookie-parser';
import type { Request, Response } from 'express';
import { config } from '../config';

/**
 * A visitor's people's choice identity, without an account: a random token in a cookie signed with
 * the session secret (cookie-parser's HMAC-SHA256 signature), so a forged or altered cookie reads as none.
 * The server stores only keyed hashes of it (`votingHash`), never the token.
 */
export const VOTER_COOKIE = 'placard.voter';
const TOKEN = /^[A-Za-z0-9_-]{43}$/;
// Long enough to outlast a show weekend; the token is useless outside the votes it hashes into.
const COOKIE_DAYS = 60;

export const readVoterCookie = cookieParser(config.sessionSecret);

export function existingVoter(req: Request): string | null {
  const value: unknown = (req.signedCookies as Record<string, unknown> | undefined)?.[VOTER_COOKIE];
  return typeof value === 'string' && TOKEN.test(value) ? value : null;
}

// New visitors' tokens come from random bytes drawn 128 tokens at a time: one call to the system's
// generator per 128 first views of a crowd, not one each. Every token's bytes are used once.
let randomPool = Buffer.alloc(0);
let poolAt = 0;
function freshToken(): string {
  if (poolAt + 32 > randomPool.length) {
    randomPool = randomBytes(32 * 128);
    poolAt = 0;
  }
  return randomPool.subarray(poolAt, (poolAt += 32)).toString('base64url');
}

/** The visitor's token, making one (and setting its cookie) on their first page view while voting is open. */
export function voterOf(req: Request, res: Response): string {
  const existing = existingVoter(req);
  if (existing) return existing;
  const token = freshToken();
  res.cookie(VOTER_COOKIE, token, { signed: true, httpOnly: true, sameSite: 'lax', secure: config.secureCookies, path: '/c', maxAge: COOKIE_DAYS * 86400_000 });
  return token;
}

/**
 * The CSRF token the vote form carries: a signed form token tied to the visitor's cookie token. A page
 * of another site can neither read it nor make one, and it is worthless with any other cookie.
 */
export const formTokenFor = (voter: string) => createHmac('sha256', config.sessionSecret).update(`placard-vote-form\0${voter}`).digest('base64url');

export function formTokenMatches(voter: string, given: unknown): boolean {
  if (typeof given !== 'string') return false;
  const want = Buffer.from(formTokenFor(voter));
  const got = Buffer.from(given);
  return got.length === want.length && timingSafeEqual(got, want);
}

const originOf = (url: string) => {
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
};

/**
 * The browser's word on where the form was sent from: an Origin header, when present, must be ours
 * (the public base URL, or the host the request was sent to); a Sec-Fetch-Site other than same-origin
 * is refused too. Neither header is required (older browsers), because the form token is.
 */
export function fromOurOrigin(req: Request): boolean {
  const origin = req.get('origin');
  if (origin !== undefined) {
    const ours = [originOf(config.publicBaseUrl), originOf(`${req.protocol}://${req.get('host') ?? ''}`)];
    if (origin === 'null' || !ours.includes(origin)) return false;
  }
  const site = req.get('sec-fetch-site');
  return site === undefined || site === 'same-origin' || site === 'none';
}

/**
 * The visitor's own record of the votes they cast (show id → the number they voted for), in a signed
 * cookie beside their token: the cached page shows their thanks without asking the database. The
 * votes table stays the judge of a second vote; a visitor whose cookie is gone just sees the button,
 * and pressing it tells them they already voted.
 */
export const VOTED_COOKIE = 'placard.voted';
const MOST_REMEMBERED = 20;

export function votesCast(req: Request): Map<number, number> {
  const value: unknown = (req.signedCookies as Record<string, unknown> | undefined)?.[VOTED_COOKIE];
  const cast = new Map<number, number>();
  if (typeof value !== 'string') return cast;
  for (const pair of value.split('.')) {
    const [show, number] = pair.split('-').map(Number);
    if (Number.isSafeInteger(show) && Number.isSafeInteger(number)) cast.set(show!, number!);
  }
  return cast;
}

export function rememberVote(req: Request, res: Response, eventId: number, number: number): void {
  const cast = votesCast(req);
  cast.delete(eventId);
  cast.set(eventId, number);
  const kept = [...cast].slice(-MOST_REMEMBERED).map(([show, n]) => `${show}-${n}`);
  res.cookie(VOTED_COOKIE, kept.join('.'), { signed: true, httpOnly: true, sameSite: 'lax', secure: config.secureCookies, path: '/c', maxAge: COOKIE_DAYS * 86400_000 });
}
