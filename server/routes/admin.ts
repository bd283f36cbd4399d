import { Router } from 'express';
import { AdminUserDisableSchema, AdminUserListQuerySchema, AdminUserUpdateSchema } from '@shared/schemas/user';
import { IdParamSchema } from '@shared/schemas/params';
import type { CaughtMailListResponse } from '@shared/schemas/mail';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeUser } from '../policies/user';
import { authorizeMail, authorizeUndeliveredMail } from '../policies/mail';
import { listUndeliveredMail } from '../services/accounts/undelivered-mail';
import { listUsers, updateRoles } from '../services/accounts/users';
import { getCaughtMail, listCaughtMail } from '../services/accounts/caught-mail';
import { presentAdminUser, presentAdminUserDetail } from '../presenters/user';
import { buildsOfAccount, findAccount, setAccountDisabled } from '../services/accounts/accounts';
import { sendResetFromAdmin } from '../services/accounts/password-resets';
import { presentCaughtMail, presentCaughtMailSummary } from '../presenters/caught-mail';
import { NotFoundError } from '../errors';
import { config } from '../config';

export const adminRouter = Router();
adminRouter.use('/admin', requireUser);

adminRouter.get('/admin/users', async (req, res) => {
  const query = parseQuery(req, AdminUserListQuerySchema);
  authorizeUser(currentUser(req), 'list');
  const { users, total } = await listUsers(query);
  res.json({ users: users.map(presentAdminUser), total, page: query.page, pageSize: query.pageSize });
});

adminRouter.patch('/admin/users/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, AdminUserUpdateSchema);
  const actor = currentUser(req);
  authorizeUser(actor, 'updateRoles', { id });
  const user = await updateRoles(actor, id, input);
  res.json({ user: presentAdminUser(user) });
});

adminRouter.get('/admin/users/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  authorizeUser(currentUser(req), 'list');
  const user = await findAccount(id);
  res.json(presentAdminUserDetail(user, await buildsOfAccount(user.id)));
});

adminRouter.put('/admin/users/:id/disabled', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { disabled } = parseBody(req, AdminUserDisableSchema);
  authorizeUser(currentUser(req), 'disable', { id });
  const user = await setAccountDisabled(id, disabled);
  res.json({ user: presentAdminUser(user) });
});

/** Mails the account a password-reset link that says the site admin sent it; a turned-off account gets none (409). */
adminRouter.post('/admin/users/:id/password-reset', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  authorizeUser(currentUser(req), 'sendReset', { id });
  const user = await findAccount(id);
  await sendResetFromAdmin(user, config.publicBaseUrl);
  res.status(202).json({ sentTo: user.email });
});

adminRouter.get('/admin/mail', async (req, res) => {
  authorizeMail(currentUser(req), 'read', { demoMode: config.demoMode });
  const body: CaughtMailListResponse = { mail: (await listCaughtMail()).map(presentCaughtMailSummary) };
  res.json(body);
});

adminRouter.get('/admin/undelivered-mail', async (req, res) => {
  authorizeUndeliveredMail(currentUser(req));
  res.json({ mail: await listUndeliveredMail() });
});

adminRouter.get('/admin/mail/:id', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  authorizeMail(currentUser(req), 'read', { demoMode: config.demoMode });
  const mail = await getCaughtMail(id);
  if (!mail) throw new NotFoundError('No such message.');
  res.json({ mail: presentCaughtMail(mail) });
});
