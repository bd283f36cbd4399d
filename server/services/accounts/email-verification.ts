import { createHash, randomBytes } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { EMAIL_VERIFICATION_TTL_HOURS } from '@shared/constants';
import { verifyEmail } from '@templates/email/verify-email';
import { EmailVerificationToken } from '../../models/email-verification-token';
import { User } from '../../models/user';
import { AppError, ConflictError } from '../../errors';
import { queueMail } from '../../mail/outbox';
import { withTransaction } from '../../db/transaction';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/** Makes a single-use confirmation link and queues its mail, in the caller's transaction. */
export async function sendVerificationMail(user: User, publicBaseUrl: string, transaction: Transaction): Promise<void> {
  const token = randomBytes(32).toString('base64url');
  await EmailVerificationToken.create(
    { userId: user.id, tokenHash: sha256(token), expiresAt: new Date(Date.now() + EMAIL_VERIFICATION_TTL_HOURS * 3600_000), usedAt: null },
    { transaction },
  );
  const link = `${publicBaseUrl}/verify-email?token=${token}`;
  await queueMail({ to: user.email, ...verifyEmail({ name: user.name, link, hours: EMAIL_VERIFICATION_TTL_HOURS }) }, { transaction });
}

/** A new link for a signed-in person whose address is not confirmed yet (the route limits how often). */
export async function resendVerificationMail(user: User, publicBaseUrl: string, outer?: Transaction): Promise<void> {
  if (user.emailVerified) throw new ConflictError('Your e-mail address is already confirmed.');
  await withTransaction(outer, (transaction) => sendVerificationMail(user, publicBaseUrl, transaction));
}

const invalidLink = () =>
  new AppError(400, 'VALIDATION_FAILED', 'This confirmation link has expired or was already used. Sign in and ask for a new one.', {
    token: 'Expired or already used.',
  });

/**
 * Confirms the address the link was sent to and spends every link of that account. A link that
 * was already used for an address now confirmed answers the same success, so a second click is harmless.
 */
export async function confirmEmail(token: string, outer?: Transaction): Promise<User> {
  return withTransaction(outer, async (transaction) => {
    const row = await EmailVerificationToken.findOne({ where: { tokenHash: sha256(token) }, lock: transaction.LOCK.UPDATE, transaction });
    if (!row) throw invalidLink();
    const user = await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw invalidLink();
    if (row.usedAt) {
      if (user.emailVerified) return user;
      throw invalidLink();
    }
    if (row.expiresAt <= new Date()) throw invalidLink();
    if (!user.emailVerified) await user.update({ emailVerifiedAt: new Date() }, { transaction });
    await EmailVerificationToken.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
    return user;
  });
}
