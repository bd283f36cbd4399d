import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import type { Request } from 'express';
import { AppError } from '../errors';
import { config } from '../config';
import { PostgresRateLimitStore } from './rate-limit-store';

const tooMany = (message: string) => () => {
  throw new AppError(429, 'RATE_LIMITED', message);
};

const ip = (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0');
const emailOf = (req: Request) => String((req.body as { email?: unknown } | undefined)?.email ?? '').trim().toLowerCase();

/** Sign-in attempts per address and e-mail: slows password guessing without locking out a whole show's Wi-Fi. */
export const signInLimiter = rateLimit({
  windowMs: config.signInRateWindowMs,
  limit: config.signInRateLimit,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) => `${ip(req)}|${emailOf(req)}`,
  store: new PostgresRateLimitStore('signin:'),
  handler: tooMany('Too many sign-in attempts. Wait a few minutes and try again.'),
});

/** Reset e-mails per address and e-mail, so the form cannot be used to flood an inbox. */
export const passwordResetLimiter = rateLimit({
  windowMs: 60 * 60 * 1000,
  limit: 5,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) => `${ip(req)}|${emailOf(req)}`,
  store: new PostgresRateLimitStore('reset:'),
  handler: tooMany('Too many reset requests. Try again in an hour.'),
});

/** Every API request per address. */
export const apiLimiter = rateLimit({
  windowMs: 60 * 1000,
  limit: config.apiRateLimitPerMinute,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: ip,
  store: new PostgresRateLimitStore('api:'),
  handler: tooMany('Too many requests. Slow down a little and try again.'),
});
