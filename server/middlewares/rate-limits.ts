import { rateLimit, ipKeyGenerator, type RateLimitRequestHandler } from 'express-rate-limit';
import { createHash } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { EMAIL_VERIFICATION_RESENDS_PER_HOUR } from '@shared/constants';
import { AppError } from '../errors';
import { config } from '../config';
import { PostgresRateLimitStore } from './rate-limit-store';
import { BatchedRateLimitStore } from './rate-limit-batched-store';

const tooMany = (message: string) => () => {
  throw new AppError(429, 'RATE_LIMITED', message);
};

const ip = (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0');
/**
 * The e-mail of the body as a short hash: read before validation, so it may be anything and any
 * length, and the counters table then never holds an address in clear.
 */
const emailOf = (req: Request) => {
  const email = String((req.body as { email?: unknown } | undefined)?.email ?? '').trim().toLowerCase();
  return createHash('sha256').update(email).digest('hex').slice(0, 32);
};
/** The signed-in person (the limiter runs after requireUser), else the address. */
const person = (req: Request) => (req.user ? `user:${(req.user as { id: number }).id}` : ip(req));

function limiter(
  name: string,
  opts: { windowMs: number; limit: number | (() => number); key: (req: Request) => string; message: string; skipSuccessfulRequests?: boolean; skipFailedRequests?: boolean; store?: PostgresRateLimitStore | BatchedRateLimitStore },
): RateLimitRequestHandler {
  return rateLimit({
    skipSuccessfulRequests: opts.skipSuccessfulRequests ?? false,
    skipFailedRequests: opts.skipFailedRequests ?? false,
    windowMs: opts.windowMs,
    limit: opts.limit,
    identifier: name,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: opts.key,
    store: opts.store ?? new PostgresRateLimitStore(`${name}:`),
    handler: tooMany(opts.message),
  });
}

const signInKey = (req: Request) => `${ip(req)}|${emailOf(req)}`;
const signInStore = new PostgresRateLimitStore('signin:');

/**
 * Failed sign-ins per address and e-mail: slows password guessing without locking out a whole show's Wi-Fi.
 * Only failures count: a successful sign-in wipes the count (`forgiveSignInFailures`), so a person who signs
 * in often is never locked out.
 */
export const signInLimiter = limiter('signin', {
  windowMs: config.signInRateWindowMs,
  limit: config.signInRateLimit,
  key: signInKey,
  message: 'Too many sign-in attempts. Wait a few minutes and try again.',
  skipSuccessfulRequests: true,
  store: signInStore,
});

/** After a good password: the failures before it no longer count against this address and e-mail. */
export const forgiveSignInFailures = (req: Request) => signInStore.resetKey(signInKey(req));

/** Failed sign-ins per address whatever the e-mail: one address trying many accounts (and a password hash each time). */
export const signInAddressLimiter = limiter('signin-address', {
  windowMs: config.signInRateWindowMs,
  limit: config.signInAddressRateLimit,
  key: ip,
  message: 'Too many sign-in attempts from this network. Wait a few minutes and try again.',
  skipSuccessfulRequests: true,
});

/** New accounts per address, so sign-up cannot be scripted into many accounts or an e-mail probe. */
export const signUpLimiter = limiter('signup-address', {
  windowMs: 60 * 60 * 1000,
  limit: config.signUpRateLimitPerHour,
  key: ip,
  message: 'Too many new accounts from this network. Try again in an hour.',
});

/** Reset e-mails per address and e-mail, so the form cannot be used to flood an inbox. */
export const passwordResetLimiter = limiter('reset', {
  windowMs: 60 * 60 * 1000,
  limit: 5,
  key: (req) => `${ip(req)}|${emailOf(req)}`,
  message: 'Too many reset requests. Try again in an hour.',
});

/**
 * Reset requests per address whatever the e-mail: the limiter above counts each e-mail on its own, so one
 * address could still mail a link to every account it can name.
 */
export const passwordResetAddressLimiter = limiter('reset-address', {
  windowMs: 60 * 60 * 1000,
  limit: config.passwordResetAddressRateLimitPerHour,
  key: ip,
  message: 'Too many reset requests from this network. Try again in an hour.',
});

/** Invitation pages read per address (the landing page reads one on each visit). */
export const invitationPreviewLimiter = limiter('invitation-preview', {
  windowMs: config.invitationRateWindowMs,
  limit: config.invitationRateLimit,
  key: ip,
  message: 'Too many invitation links opened from this network. Wait a few minutes and try again.',
});

/** Invitation acceptances per address, refused ones included. */
export const invitationAcceptLimiter = limiter('invitation-accept', {
  windowMs: config.invitationRateWindowMs,
  limit: config.invitationRateLimit,
  key: ip,
  message: 'Too many attempts to accept an invitation. Wait a few minutes and try again.',
});

/** Reset confirmations per address: each one that holds a live token spends a password hash. */
export const passwordResetConfirmLimiter = limiter('reset-confirm', {
  windowMs: 60 * 60 * 1000,
  limit: 20,
  key: ip,
  message: 'Too many attempts. Ask for a new reset link and try again in an hour.',
});

/** Password changes per person: each attempt checks the current password with a full argon2 hash. */
export const PASSWORD_CHANGE_LIMIT = { windowMs: 15 * 60 * 1000, limit: 10 };
export const passwordChangeLimiter = limiter('password-change', {
  ...PASSWORD_CHANGE_LIMIT,
  key: person,
  message: 'Too many password changes. Wait a few minutes and try again.',
});

/** New confirmation links per signed-in person (each one is a mail). */
export const verificationResendLimiter = limiter('verify-resend', {
  windowMs: 60 * 60 * 1000,
  limit: EMAIL_VERIFICATION_RESENDS_PER_HOUR,
  key: person,
  message: 'You asked for several links already. Use the newest one, or try again in an hour.',
});

/** Confirmation attempts per address: guessing a token is hopeless, and this keeps it so. */
export const verificationConfirmLimiter = limiter('verify-confirm', {
  windowMs: 60 * 60 * 1000,
  limit: 30,
  key: ip,
  message: 'Too many attempts. Try again in an hour.',
});

/** Card PDFs per person: each render lays out a whole page and embeds a photo (the designer asks for one per change, 350 ms apart). */
export const CARD_RENDER_LIMIT = { windowMs: 60 * 1000, limit: 60 };
export const cardRenderLimiter = limiter('card-render', {
  ...CARD_RENDER_LIMIT,
  key: person,
  message: 'Too many cards at once. Wait a minute and try again.',
});

/** Photo uploads per person (the client sends one file per request): each is decoded and re-encoded six times. */
export const PHOTO_UPLOAD_LIMIT = { windowMs: 15 * 60 * 1000, limit: config.photoUploadsPerWindow };
export const photoUploadLimiter = limiter('photo-upload', {
  ...PHOTO_UPLOAD_LIMIT,
  key: person,
  message: 'Too many uploads in a short time. Wait a few minutes and try again.',
});

/**
 * The API request counters: in this process, merged into PostgreSQL once a second (no statement per
 * request; see BatchedRateLimitStore for what several processes may let through between merges).
 */
export const apiRateLimitStore = new BatchedRateLimitStore('api:');
const apiRequests = limiter('api', {
  windowMs: 60 * 1000,
  // Read per request, so a test may lower it for a while.
  limit: () => config.apiRateLimitPerMinute,
  key: person,
  message: 'Too many requests. Slow down a little and try again.',
  store: apiRateLimitStore,
});
const counted = Symbol('api request counted');

/**
 * Every API request, once: a signed-in person's by their account (judges and the gate on one show Wi-Fi
 * each have their own budget), anyone else's by address. Mounted before the public JSON (no session
 * there: by address) and again after the session is read; a request is counted at the first it reaches.
 */
export const apiLimiter: RequestHandler = (req, res, next) => {
  const r = req as Request & { [counted]?: true };
  if (r[counted]) return next();
  r[counted] = true;
  return apiRequests(req, res, next);
};

/**
 * People's choice vote attempts per address, refused ones included. Each visitor votes once per show,
 * so this only slows one machine minting new cookies; a show's Wi-Fi or a carrier's shared address can
 * carry many honest visitors, hence a generous default (common practice, no published figure). Beyond
 * it, the organiser voids an address's votes by hand.
 */
export const voteLimiter = limiter('vote', {
  windowMs: config.voteRateWindowMs,
  limit: config.voteRateLimit,
  key: ip,
  message: 'Too many votes from this network. Wait a while and try again.',
});

/**
 * Counted votes per address: only a vote that counted (a 303) stays on the count, so this slows bursts of new
 * voters (one machine clearing its cookies) well below the attempts limit above, while refusals cost nothing
 * here. The organiser sees such bursts and voids one on its own (`voteBursts`).
 */
export const voteNewVoterLimiter = limiter('vote-new-voter', {
  windowMs: config.voteNewVoterWindowMs,
  limit: config.voteNewVoterLimit,
  key: ip,
  message: 'Many new voters from this network in a few minutes. Wait a while and try again.',
  skipFailedRequests: true,
});

/**
 * Visitors' questions per address, refused ones included (before the body is read). A person at a show
 * asks one or two; a show's Wi-Fi shares an address, so the limit is per hour rather than per day.
 */
export const questionLimiter = limiter('question', {
  windowMs: config.questionRateWindowMs,
  limit: config.questionRateLimit,
  key: ip,
  message: 'Many questions from this network. Wait a while and try again.',
});
