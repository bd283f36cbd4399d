import { Router } from 'express';
import { AccountUpdateSchema, PasswordChangeSchema, type AccountUpdateInput, type PasswordChangeInput } from '@shared/schemas/user';
import { validate } from '../middlewares/validate';
import { passwordChangeLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeUser } from '../policies/user';
import { changePassword, updateAccount } from '../services/users';
import { presentCurrentUser } from '../presenters/user';

export const accountRouter = Router();

accountRouter.patch('/account', requireUser, validate('body', AccountUpdateSchema), async (req, res) => {
  const user = currentUser(req);
  authorizeUser(user, 'updateAccount', user);
  const updated = await updateAccount(user, res.locals.body as AccountUpdateInput);
  res.json({ user: presentCurrentUser(updated) });
});

accountRouter.post('/account/password', requireUser, passwordChangeLimiter, validate('body', PasswordChangeSchema), async (req, res) => {
  const user = currentUser(req);
  authorizeUser(user, 'updateAccount', user);
  await changePassword(user, res.locals.body as PasswordChangeInput, req.sessionID);
  res.status(204).end();
});
