import { Router } from 'express';
import { EmailVerificationConfirmSchema, type EmailVerificationConfirmResponse } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { requireUser, currentUser } from '../middlewares/authenticate';
import { verificationConfirmLimiter, verificationResendLimiter } from '../middlewares/rate-limits';
import { confirmEmail, resendVerificationMail } from '../services/accounts/email-verification';
import { config } from '../config';
import { signedUpHere } from '../auth/sign-up-session';
import { startSession } from '../auth/session-helpers';
import { sessionBody } from './session';

export const emailVerificationsRouter = Router();

/**
 * The landing page of the link posts its token here (a GET would be spent by mail scanners that open
 * links). In the browser that signed up, confirming also signs the new account in.
 */
emailVerificationsRouter.post('/email-verifications/confirm', verificationConfirmLimiter, async (req, res) => {
  const { token } = parseBody(req, EmailVerificationConfirmSchema);
  const user = await confirmEmail(token);
  const signInNow = signedUpHere(req, user);
  if (signInNow) await startSession(req, user);
  const body: EmailVerificationConfirmResponse = { verified: true, session: signInNow ? sessionBody(req) : null };
  res.json(body);
});

/** A new link for the signed-in person, a few an hour. */
emailVerificationsRouter.post('/account/email-verification', requireUser, verificationResendLimiter, async (req, res) => {
  await resendVerificationMail(currentUser(req), config.publicBaseUrl);
  res.status(202).json({ message: 'A new confirmation link is on its way.' });
});
