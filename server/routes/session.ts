import { Router, type Request } from 'express';
import { SignInSchema, type SessionResponse } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { csrfToken } from '../middlewares/csrf';
import { forgiveSignInFailures, signInAddressLimiter, signInLimiter } from '../middlewares/rate-limits';
import { authenticateLocal, signOut, startSession } from '../auth/session-helpers';
import { presentCurrentUser } from '../presenters/user';
import { AppError, ForbiddenError } from '../errors';
import { config } from '../config';

export const SESSION_COOKIE = 'placard.sid';
export const sessionRouter = Router();

export const sessionBody = (req: Request): SessionResponse => ({
  user: req.user ? presentCurrentUser(req.user) : null,
  csrfToken: csrfToken(req),
  demoMode: config.demoMode,
});

// A visitor's session only carries a CSRF token: keep it a day, not the signed-in month, so the table stays small.
const ANONYMOUS_SESSION_MS = 24 * 3600 * 1000;

/** Who is signed in, what they may do, and the CSRF token for the next write. */
sessionRouter.get('/session', (req, res) => {
  if (!req.user) req.session.cookie.maxAge = ANONYMOUS_SESSION_MS;
  res.json(sessionBody(req));
});

sessionRouter.post('/session', signInAddressLimiter, signInLimiter, async (req, res) => {
  parseBody(req, SignInSchema); // a 400 naming the field before passport looks at the body
  const found = await authenticateLocal(req, res);
  if (!found.user && found.disabled) throw new ForbiddenError('This account is turned off. Ask the site admin.'); // the password was right: say why, not "wrong password"
  if (!found.user) throw new AppError(401, 'UNAUTHENTICATED', 'That e-mail and password do not match an account.', { password: 'E-mail or password is not right.' });
  const { user } = found;
  await forgiveSignInFailures(req);
  await startSession(req, user);
  res.json(sessionBody(req));
});

sessionRouter.delete('/session', async (req, res) => {
  await signOut(req, res, SESSION_COOKIE);
  res.status(204).end();
});
