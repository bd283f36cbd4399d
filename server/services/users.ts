import { Op, type Transaction } from 'sequelize';
import type { AccountUpdateInput, AdminUserListQuery, AdminUserUpdateInput, PasswordChangeInput, SignUpInput } from '@shared/schemas/user';
import { sequelize } from '../db/sequelize';
import { User } from '../models/user';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../errors';
import { destroySessionsOf } from './sessions';

export async function signUp(input: SignUpInput, transaction?: Transaction): Promise<User> {
  const existing = await User.findOne({ where: { email: input.email }, transaction });
  if (existing) throw new ConflictError('An account with this e-mail already exists.', { email: 'An account with this e-mail already exists. Sign in or reset the password.' });
  const passwordHash = await hashPassword(input.password);
  return User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
}

export async function updateAccount(user: User, input: AccountUpdateInput): Promise<User> {
  return user.update({ name: input.name });
}

/** Changes the password after checking the current one; every other session of the person ends. */
export async function changePassword(user: User, input: PasswordChangeInput, currentSid: string): Promise<void> {
  if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw new ValidationError({ currentPassword: 'The current password is not right.' });
  }
  const passwordHash = await hashPassword(input.newPassword);
  await sequelize.transaction(async (transaction) => {
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
