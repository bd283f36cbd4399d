import { Router } from 'express';
import { SignUpSchema, type SignUpInput } from '@shared/schemas/user';
import { validate } from '../middlewares/validate';
import { csrfToken } from '../middlewares/csrf';
import { signInLimiter, signUpLimiter } from '../middlewares/rate-limits';
import { signIn } from '../auth/session-helpers';
import { signUp } from '../services/users';
import { presentCurrentUser } from '../presenters/user';
import { config } from '../config';

export const usersRouter = Router();

/** Sign-up: makes the account and signs it in (new session id, new CSRF token). */
usersRouter.post('/users', signUpLimiter, signInLimiter, validate('body', SignUpSchema), async (req, res) => {
  const user = await signUp(res.locals.body as SignUpInput);
  await signIn(req, user);
  res.status(201).json({ user: presentCurrentUser(user), csrfToken: csrfToken(req, true), demoMode: config.demoMode });
});
