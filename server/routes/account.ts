import { Router } from 'express';
import { AccountUpdateSchema, PasswordChangeSchema } from '@shared/schemas/user';
import { parseBody } from '../middlewares/validate';
import { passwordChangeLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeUser } from '../policies/user';
import { changePassword, updateAccount } from '../services/accounts/users';
import { presentCurrentUser } from '../presenters/user';

export const accountRouter = Router();

accountRouter.patch('/account', requireUser, async (req, res) => {
  const input = parseBody(req, AccountUpdateSchema);
  const user = currentUser(req);
  authorizeUser(user, 'updateAccount', user);
  const updated = await updateAccount(user, input);
  res.json({ user: presentCurrentUser(updated) });
});

accountRouter.post('/account/password', requireUser, passwordChangeLimiter, async (req, res) => {
  const input = parseBody(req, PasswordChangeSchema);
  const user = currentUser(req);
  authorizeUser(user, 'updateAccount', user);
  await changePassword(user, input, req.sessionID);
  res.status(204).end();
});
