import { Router } from 'express';
import { SignUpSchema, type SignUpResponse } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { signInLimiter, signUpLimiter } from '../middlewares/rate-limits';
import { signUp } from '../services/accounts/users';
import { config } from '../config';
import { rememberSignUp } from '../auth/sign-up-session';

export const usersRouter = Router();

const SIGN_UP_MESSAGE = 'Check your inbox: we sent a message to that address. Open its link in this browser to carry on.';

/**
 * Sign-up answers the same 202 whether or not the address already has an account, and answers
 * before any work is done (a password hash, rows, a mail), so neither the words nor the time tell
 * who is registered. The mail says which it was; the confirmation link, opened in this browser,
 * signs the new account in (see auth/sign-up-session.ts).
 */
usersRouter.post('/users', signUpLimiter, signInLimiter, (req, res) => {
  const input = parseBody(req, SignUpSchema);
  rememberSignUp(req, input.email);
  const body: SignUpResponse = { message: SIGN_UP_MESSAGE, demoMode: config.demoMode };
  res.status(202).json(body);
  void signUp(input, config.publicBaseUrl).catch((err: unknown) => req.log.error({ err }, 'sign-up failed after answering'));
});
