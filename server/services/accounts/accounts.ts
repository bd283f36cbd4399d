import { Op, type Transaction } from 'sequelize';
import { User } from '../../models/user';
import { Build } from '../../models/build';
import { AppError, NotFoundError } from '../../errors';
import { destroySessionsOf } from './sessions';
import { withTransaction } from '../../db/transaction';

/** The site admin's view of accounts: disable, re-enable, open one with its builds. */

export async function findAccount(id: number, transaction?: Transaction): Promise<User> {
  const user = await User.findByPk(id, { transaction });
  if (!user) throw new NotFoundError('No such account.');
  return user;
}

/** Active site admins other than `exceptId`: the site must always keep one who can sign in. */
export const otherActiveAdmins = (exceptId: number, transaction?: Transaction) =>
  User.count({ where: { isSiteAdmin: true, disabledAt: null, id: { [Op.ne]: exceptId } }, transaction });

/**
 * Disables or re-enables an account. A disabled account cannot sign in, every session it holds
 * ends at once, and its public pages go offline (the owner row's updatedAt changes their cache version).
 */
export async function setAccountDisabled(targetId: number, disabled: boolean, outer?: Transaction): Promise<User> {
  return withTransaction(outer, async (transaction) => {
    const target = await User.findByPk(targetId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!target) throw new NotFoundError('No such account.');
    if (disabled && target.isSiteAdmin && (await otherActiveAdmins(target.id, transaction)) === 0) {
      throw new AppError(400, 'VALIDATION_FAILED', 'This is the last site admin who can sign in.', { disabled: 'Make another account site admin first.' });
    }
    if (Boolean(target.disabledAt) === disabled) return target; // already so: nothing changes, no new timestamp
    target.changed('updatedAt', true);
    await target.update({ disabledAt: disabled ? new Date() : null }, { transaction });
    if (disabled) await destroySessionsOf(target.id, undefined, transaction);
    return target;
  });
}

/** The builds of one account, newest change first, for the site admin. */
export const buildsOfAccount = (ownerId: number) =>
  Build.findAll({ where: { ownerId }, attributes: ['id', 'title', 'published', 'code', 'updatedAt'], order: [['updatedAt', 'DESC'], ['id', 'DESC']] });

export async function recordSignIn(user: User): Promise<void> {
  await user.update({ lastSignInAt: new Date() }, { silent: true }); // silent: a sign-in is not a change to the account
}
