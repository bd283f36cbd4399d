import type { Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';

/** Signs a person out everywhere (after a password change or reset), optionally keeping the current session. */
export async function destroySessionsOf(userId: number, keepSid?: string, transaction?: Transaction): Promise<void> {
  await sequelize.query(
    `DELETE FROM session WHERE (sess -> 'passport' ->> 'user') = :userId ${keepSid ? 'AND sid <> :keepSid' : ''}`,
    { replacements: { userId: String(userId), keepSid: keepSid ?? null }, transaction },
  );
}
