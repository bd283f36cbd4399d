import { Router } from 'express';
import { AdminUserDisableSchema, AdminUserListQuerySchema, AdminUserUpdateSchema, type AdminUserListQuery, type AdminUserUpdateInput } from '@shared/schemas/user';
import { IdParamSchema } from '@shared/schemas/params';
import type { CaughtMailListResponse } from '@shared/schemas/mail';
import { parseBody, parseParams, validate } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeUser } from '../policies/user';
import { authorizeMail } from '../policies/mail';
import { listUsers, updateRoles } from '../services/users';
import { getCaughtMail, listCaughtMail } from '../services/caught-mail';
import { presentAdminUser, presentAdminUserDetail } from '../presenters/user';
import { buildsOfAccount, findAccount, setAccountDisabled } from '../services/accounts';
import { requestPasswordReset } from '../services/password-resets';
import { presentCaughtMail, presentCaughtMailSummary } from '../presenters/caught-mail';
import { NotFoundError } from '../errors';
import { config } from '../config';

export const adminRouter = Router();
adminRouter.use('/admin', requireUser);

adminRouter.get('/admin/users', validate('query', AdminUserListQuerySchema), async (req, res) => {
  authorizeUser(currentUser(req), 'list');
  const query = res.locals.query as AdminUserListQuery;
  const { users, total } = await listUsers(query);
  res.json({ users: users.map(presentAdminUser), total, page: query.page, pageSize: query.pageSize });
});

adminRouter.patch('/admin/users/:id', validate('params', IdParamSchema), validate('body', AdminUserUpdateSchema), async (req, res) => {
  const actor = currentUser(req);
  const { id } = res.locals.params as { id: number };
  authorizeUser(actor, 'updateRoles', { id });
  const user = await updateRoles(actor, id, res.locals.body as AdminUserUpdateInput);
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

/** Mails the account a password-reset link, as if its owner had asked on the sign-in page. */
adminRouter.post('/admin/users/:id/password-reset', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  authorizeUser(currentUser(req), 'sendReset', { id });
  const user = await findAccount(id);
  await requestPasswordReset(user.email, config.publicBaseUrl);
  res.status(202).json({ sentTo: user.email });
});

adminRouter.get('/admin/mail', async (req, res) => {
  authorizeMail(currentUser(req), 'read', { demoMode: config.demoMode });
  const body: CaughtMailListResponse = { mail: (await listCaughtMail()).map(presentCaughtMailSummary) };
  res.json(body);
});

adminRouter.get('/admin/mail/:id', validate('params', IdParamSchema), async (req, res) => {
  authorizeMail(currentUser(req), 'read', { demoMode: config.demoMode });
  const mail = await getCaughtMail((res.locals.params as { id: number }).id);
  if (!mail) throw new NotFoundError('No such message.');
  res.json({ mail: presentCaughtMail(mail) });
});
