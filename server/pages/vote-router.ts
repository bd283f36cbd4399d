import express, { Router, type ErrorRequestHandler, type Response } from 'express';
import { BuildCodeSchema } from '@shared/schemas/build';
import { EventSlugSchema } from '@shared/schemas/show';
import { voteLimiter, voteNewVoterLimiter } from '../middlewares/rate-limits';
import { castVote } from '../services/results/peoples-choice';
import { isDatabaseUnavailable } from '../services/platform/database-unavailable';
import { existingVoter, formTokenMatches, fromOurOrigin, readVoterCookie, rememberVote } from './voter';
import { renderVoteRefusal, type VoteRefusal } from './vote-box';

/** People's choice votes: a plain form POST from the public build page, no account, no script. */
export const votePagesRouter = Router();

function refuse(res: Response, reason: VoteRefusal, backUrl: string, votedNumber: number | null = null) {
  const { status, html } = renderVoteRefusal(reason, backUrl, votedNumber);
  res.status(status).set('Cache-Control', 'no-store').type('html').send(html);
}

votePagesRouter.post(
  '/c/:code/vote',
  voteLimiter, // before anything is read, so refused votes count too
  voteNewVoterLimiter, // counts only votes that counted: one address's burst of new voters
  express.urlencoded({ extended: false, limit: '2kb', parameterLimit: 5 }),
  readVoterCookie,
  async (req, res) => {
    const code = String(req.params.code).toUpperCase();
    const back = `/c/${encodeURIComponent(code)}`;
    if (!BuildCodeSchema.safeParse(code).success) return refuse(res, 'not-entered', '/');
    const voter = existingVoter(req);
    const token: unknown = (req.body as Record<string, unknown> | undefined)?.token;
    if (!fromOurOrigin(req) || !voter || !formTokenMatches(voter, token)) return refuse(res, 'stale-form', back);
    // The show the form belongs to rides in its address (a car can be in two shows, each with its own vote).
    const show = EventSlugSchema.safeParse(req.query.show);
    const outcome = await castVote({ code, show: show.success ? show.data : undefined, voterToken: voter, address: req.ip ?? '' });
    if (!outcome.ok && outcome.reason === 'twice' && outcome.votedNumber !== null) rememberVote(req, res, outcome.eventId, outcome.votedNumber);
    if (!outcome.ok) return refuse(res, outcome.reason, show.success ? `${back}?show=${encodeURIComponent(show.data)}` : back, outcome.reason === 'twice' ? outcome.votedNumber : null);
    rememberVote(req, res, outcome.eventId, outcome.entryNumber);
    // Back to the car with that show first, where the visitor's own box now thanks them: a fresh page, never a cached one.
    res.set('Cache-Control', 'no-store').redirect(303, `${back}?show=${encodeURIComponent(outcome.showSlug)}#vote-${outcome.showSlug}`);
  },
);

/** The limiter's 429, the body parser's 4xx and a database that is away answer as pages too, since a person pressed a button. */
const votePageErrors: ErrorRequestHandler = (err, req, res, next) => {
  const back = `/c/${encodeURIComponent(String(req.params.code ?? ''))}`;
  if (res.headersSent) return next(err);
  if (isDatabaseUnavailable(err)) {
    req.log?.warn({ err }, 'database unavailable: vote not counted');
    res.set('Retry-After', '5');
    return refuse(res, 'unavailable', back);
  }
  const status = (err as { status?: unknown }).status;
  if (typeof status !== 'number' || status < 400 || status >= 500) return next(err);
  refuse(res, status === 429 ? 'too-many' : 'unreadable', back);
};
votePagesRouter.use('/c/:code/vote', votePageErrors);
