import { Router } from 'express';
import { SignUpSchema } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { csrfToken } from '../middlewares/csrf';
import { signInLimiter, signUpLimiter } from '../middlewares/rate-limits';
import { signIn } from '../auth/session-helpers';
import { signUp } from '../services/users';
import { presentCurrentUser } from '../presenters/user';
import { config } from '../config';

export const usersRouter = Router();

/** Sign-up: makes the account and signs it in (new session id, new CSRF token). */
usersRouter.post('/users', signUpLimiter, signInLimiter, async (req, res) => {
  const user = await signUp(parseBody(req, SignUpSchema));
  await signIn(req, user);
  res.status(201).json({ user: presentCurrentUser(user), csrfToken: csrfToken(req, true), demoMode: config.demoMode });
});
