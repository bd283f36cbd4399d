import { Router, type Request, type Response } from 'express';
import { SignUpSchema, type SignUpInput, type SignUpResponse } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { signInLimiter, signUpLimiter } from '../middlewares/rate-limits';
import { signUp } from '../services/accounts/users';
import { openInvitationAddress } from '../services/shows/event-people';
import { config } from '../config';
import { rememberSignUp } from '../auth/sign-up-session';
import { startSession } from '../auth/session-helpers';
import { sessionBody } from './session';

export const usersRouter = Router();

const SIGN_UP_MESSAGE = 'Check your inbox: we sent a message to that address. Open its link in this browser to carry on.';
const SIGNED_UP_FROM_INVITATION = 'Your account is ready and your address is confirmed by the invitation. You are signed in.';

/**
 * Sign-up answers the same 202 whether or not the address already has an account, and answers
 * before any work is done (a password hash, rows, a mail), so neither the words nor the time tell
 * who is registered. The mail says which it was; the confirmation link, opened in this browser,
 * signs the new account in (see auth/sign-up-session.ts).
 *
 * One exception: sign-up from an open invitation with the invited address. The invitation's mail
 * already proved the address, so the account is made confirmed at once (no second mail) and signed
 * in, ready to accept. Only someone holding that address's invitation link can tell this way whether
 * the address had an account.
 */
usersRouter.post('/users', signUpLimiter, signInLimiter, async (req, res) => {
  const input = parseBody(req, SignUpSchema);
  if (input.invitationToken && (await openInvitationAddress(input.invitationToken)) === input.email) {
    await signUpFromInvitation(req, res, input);
    return;
  }
  rememberSignUp(req, input.email);
  const body: SignUpResponse = { message: SIGN_UP_MESSAGE, demoMode: config.demoMode, session: null };
  res.status(202).json(body);
  void signUp(input, config.publicBaseUrl).catch((err: unknown) => req.log.error({ err }, 'sign-up failed after answering'));
});

async function signUpFromInvitation(req: Request, res: Response, input: SignUpInput) {
  const user = await signUp(input, config.publicBaseUrl, { addressProven: true });
  if (!user) {
    // The address has an account already: the same answer as any sign-up, and the mail says so.
    const body: SignUpResponse = { message: SIGN_UP_MESSAGE, demoMode: config.demoMode, session: null };
    res.status(202).json(body);
    return;
  }
  await startSession(req, user);
  const body: SignUpResponse = { message: SIGNED_UP_FROM_INVITATION, demoMode: config.demoMode, session: sessionBody(req) };
  res.status(201).json(body);
}
