import { Router } from 'express';
import { EmailVerificationConfirmSchema, type EmailVerificationConfirmResponse } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { requireUser, currentUser } from '../middlewares/authenticate';
import { verificationConfirmLimiter, verificationResendLimiter } from '../middlewares/rate-limits';
import { confirmEmail, resendVerificationMail } from '../services/email-verification';
import { config } from '../config';

export const emailVerificationsRouter = Router();

/** The landing page of the link posts its token here (a GET would be spent by mail scanners that open links). */
emailVerificationsRouter.post('/email-verifications/confirm', verificationConfirmLimiter, async (req, res) => {
  const { token } = parseBody(req, EmailVerificationConfirmSchema);
  await confirmEmail(token);
  const body: EmailVerificationConfirmResponse = { verified: true };
  res.json(body);
});

/** A new link for the signed-in person, a few an hour. */
emailVerificationsRouter.post('/account/email-verification', requireUser, verificationResendLimiter, async (req, res) => {
  await resendVerificationMail(currentUser(req), config.publicBaseUrl);
  res.status(202).json({ message: 'A new confirmation link is on its way.' });
});
