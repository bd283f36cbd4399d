import type { Transaction } from 'sequelize';
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import { PASSWORD_RESET_TTL_MINUTES } from '@shared/constants';
import type { PasswordResetConfirmInput } from '@shared/schemas/user';
import { passwordResetEmail, type ResetAskedBy } from '@templates/email/password-reset';
import { withTransaction } from '../../db/transaction';
import { PasswordResetToken } from '../../models/password-reset-token';
import { User } from '../../models/user';
import { hashPassword } from '../../auth/passwords';
import { AppError, ConflictError } from '../../errors';
import { queueMail } from '../../mail/outbox';
import { destroySessionsOf } from './sessions';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/**
 * Mails a single-use link when the e-mail has an account. The caller answers the same either way,
 * so the form does not reveal who has an account.
 */
export async function requestPasswordReset(email: string, publicBaseUrl: string): Promise<void> {
  const user = await User.findOne({ where: { email } });
  // A turned-off account gets no link (it could not sign in with the new password); the answer is the same either way.
  if (user && !user.disabledAt) await mailResetLink(user, publicBaseUrl, 'owner');
}

/**
 * The site admin mails an account a reset link. A turned-off account is refused: the link could
 * not get its owner back in, and the mail would say otherwise.
 */
export async function sendResetFromAdmin(user: User, publicBaseUrl: string, outer?: Transaction): Promise<void> {
  if (user.disabledAt) {
    throw new ConflictError('This account is turned off, so no reset link was sent. Enable the account first.');
  }
  await mailResetLink(user, publicBaseUrl, 'site-admin', outer);
}

async function mailResetLink(user: User, publicBaseUrl: string, askedBy: ResetAskedBy, outer?: Transaction): Promise<void> {
  const token = randomBytes(32).toString('base64url');
  const link = `${publicBaseUrl}/reset-password?token=${token}`;
  // The token and its mail are one write: no mail for a token that was not saved, no token without its mail.
  await withTransaction(outer, async (transaction) => {
    await PasswordResetToken.create(
      { userId: user.id, tokenHash: sha256(token), expiresAt: new Date(Date.now() + PASSWORD_RESET_TTL_MINUTES * 60_000), usedAt: null },
      { transaction },
    );
    await queueMail({ to: user.email, ...passwordResetEmail({ name: user.name, link, minutes: PASSWORD_RESET_TTL_MINUTES, askedBy }) }, { transaction });
  });
}

const invalidLink = () =>
  new AppError(400, 'VALIDATION_FAILED', 'This reset link has expired or was already used. Ask for a new one.', { token: 'Expired or already used.' });

/** Sets the new password, spends the token and every other unspent one, and signs the person out everywhere. */
export async function confirmPasswordReset(input: PasswordResetConfirmInput, outer?: Transaction): Promise<User> {
  const live = () => ({ tokenHash: sha256(input.token), usedAt: null, expiresAt: { [Op.gt]: new Date() } });
  // A password hash costs real memory and time: spend it only for a link that works (checked again under the lock).
  if ((await PasswordResetToken.count({ where: live() })) === 0) throw invalidLink();
  const passwordHash = await hashPassword(input.password);
  return withTransaction(outer, async (transaction) => {
    const token = await PasswordResetToken.findOne({
      where: live(),
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!token) throw invalidLink();
    const user = await User.findByPk(token.userId, { transaction });
    if (!user) throw invalidLink();
    await user.update({ passwordHash }, { transaction });
    await PasswordResetToken.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
    await destroySessionsOf(user.id, undefined, transaction);
    return user;
  });
}
