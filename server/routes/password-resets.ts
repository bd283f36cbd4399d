import { Router } from 'express';
import { PasswordResetConfirmSchema, PasswordResetRequestSchema } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { passwordResetAddressLimiter, passwordResetConfirmLimiter, passwordResetLimiter } from '../middlewares/rate-limits';
import { confirmPasswordReset, requestPasswordReset } from '../services/accounts/password-resets';
import { config } from '../config';

export const passwordResetsRouter = Router();

// The same 202 whether or not the e-mail has an account, so the form tells nobody who is registered.
// The answer goes first and the token and mail are made after it: waiting for them would make a
// known e-mail answer measurably slower than an unknown one.
passwordResetsRouter.post('/password-resets', passwordResetAddressLimiter, passwordResetLimiter, (req, res) => {
  const { email } = parseBody(req, PasswordResetRequestSchema);
  res.status(202).json({ message: 'If that e-mail has an account, a reset link is on its way.' });
  void requestPasswordReset(email, config.publicBaseUrl).catch((err: unknown) => req.log.error({ err }, 'password reset mail failed'));
});

passwordResetsRouter.post('/password-resets/confirm', passwordResetConfirmLimiter, async (req, res) => {
  await confirmPasswordReset(parseBody(req, PasswordResetConfirmSchema));
  res.status(204).end();
});
