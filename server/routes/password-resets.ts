import { Router } from 'express';
import { PasswordResetConfirmSchema, PasswordResetRequestSchema, type PasswordResetConfirmInput, type PasswordResetRequestInput } from '@shared/schemas/user';
import { validate } from '../middlewares/validate';
import { passwordResetLimiter } from '../middlewares/rate-limits';
import { confirmPasswordReset, requestPasswordReset } from '../services/password-resets';
import { config } from '../config';

export const passwordResetsRouter = Router();

// The same 202 whether or not the e-mail has an account, so the form tells nobody who is registered.
passwordResetsRouter.post('/password-resets', passwordResetLimiter, validate('body', PasswordResetRequestSchema), async (req, res) => {
  const { email } = res.locals.body as PasswordResetRequestInput;
  await requestPasswordReset(email, config.publicBaseUrl).catch((err: unknown) => req.log.error({ err }, 'password reset mail failed'));
  res.status(202).json({ message: 'If that e-mail has an account, a reset link is on its way.' });
});

passwordResetsRouter.post('/password-resets/confirm', validate('body', PasswordResetConfirmSchema), async (_req, res) => {
  await confirmPasswordReset(res.locals.body as PasswordResetConfirmInput);
  res.status(204).end();
});
