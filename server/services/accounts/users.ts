import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { AccountUpdateInput, AdminUserListQuery, AdminUserUpdateInput, PasswordChangeInput, SignUpInput } from '@shared/schemas/user';
import { withTransaction } from '../../db/transaction';
import { User } from '../../models/user';
import { hashPassword, verifyPassword } from '../../auth/passwords';
import { accountExistsEmail } from '@templates/email/account-exists';
import { AppError, NotFoundError, ValidationError } from '../../errors';
import { queueMail } from '../../mail/outbox';
import { destroySessionsOf } from './sessions';
import { sendVerificationMail } from './email-verification';

/**
 * Sign-up tells the caller nothing about the address: a new one gets an unconfirmed account and a
 * confirmation link; one that already has an account gets a mail saying so (at most one an hour, so
 * sign-up cannot flood someone's inbox). Resolves with the new account, or null.
 */
export async function signUp(input: SignUpInput, publicBaseUrl: string, opts: { addressProven?: boolean } = {}, outer?: Transaction): Promise<User | null> {
  const passwordHash = await hashPassword(input.password);
  try {
    return await withTransaction(outer, async (transaction) => {
      const existing = await User.findOne({ where: { email: input.email }, transaction });
      if (existing) {
        await mailAccountExists(existing, publicBaseUrl, transaction);
        return null;
      }
      // An address already proven (the person came from a mail sent to it) needs no second mail.
      const user = await User.create({ email: input.email, name: input.name, passwordHash, emailVerifiedAt: opts.addressProven ? new Date() : null }, { transaction });
      if (!opts.addressProven) await sendVerificationMail(user, publicBaseUrl, transaction);
      return user;
    });
  } catch (err) {
    // Two sign-ups with one address at once: the second finds the first's account on a second look.
    if (err instanceof UniqueConstraintError) return signUp(input, publicBaseUrl, opts);
    throw err;
  }
}

async function mailAccountExists(user: User, publicBaseUrl: string, transaction: Transaction) {
  const hour = new Date().toISOString().slice(0, 13);
  const mail = accountExistsEmail({ name: user.name, signInLink: `${publicBaseUrl}/sign-in`, resetLink: `${publicBaseUrl}/reset-password` });
  await queueMail({ to: user.email, ...mail }, { transaction, dedupeKey: `account-exists:${user.id}:${hour}` });
}

export async function updateAccount(user: User, input: AccountUpdateInput): Promise<User> {
  // Hometown and club change only when sent; '' clears one (nothing is shown).
  const changes: { name: string; hometown?: string | null; club?: string | null } = { name: input.name };
  if (input.hometown !== undefined) changes.hometown = input.hometown || null;
  if (input.club !== undefined) changes.club = input.club || null;
  return user.update(changes);
}

/** Changes the password after checking the current one; every other session of the person ends. */
export async function changePassword(user: User, input: PasswordChangeInput, currentSid: string, outer?: Transaction): Promise<void> {
  if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw new ValidationError({ currentPassword: 'The current password is not right.' });
  }
  const passwordHash = await hashPassword(input.newPassword);
  await withTransaction(outer, async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await destroySessionsOf(user.id, currentSid, transaction);
  });
}

export async function listUsers(query: AdminUserListQuery) {
  const where = query.q
    ? { [Op.or]: [{ email: { [Op.iLike]: `%${query.q}%` } }, { name: { [Op.iLike]: `%${query.q}%` } }] }
    : {};
  const { rows, count } = await User.findAndCountAll({
    where,
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { users: rows, total: count };
}

export async function updateRoles(actor: User, targetId: number, input: AdminUserUpdateInput): Promise<User> {
  const target = await User.findByPk(targetId);
  if (!target) throw new NotFoundError('No such account.');
  if (target.id === actor.id && input.isSiteAdmin === false) {
    throw new AppError(400, 'VALIDATION_FAILED', 'You cannot remove your own site admin role.', { isSiteAdmin: 'Ask another site admin to do this.' });
  }
  return target.update({
    ...(input.mayOrganise !== undefined ? { mayOrganise: input.mayOrganise } : {}),
    ...(input.isSiteAdmin !== undefined ? { isSiteAdmin: input.isSiteAdmin } : {}),
  });
}
