import { randomUUID } from 'node:crypto';
import { User } from '@server/models/user';
import { hashPassword } from '@server/auth/passwords';

export const DEFAULT_PASSWORD = 'correct horse battery';

/** A user with a unique e-mail, so test files can run side by side on one database. */
/** Addresses are confirmed unless `emailVerified: false` asks for an account that has not followed its link yet. */
export async function createUser(overrides: Partial<{ email: string; name: string; password: string; isSiteAdmin: boolean; mayOrganise: boolean; emailVerified: boolean }> = {}) {
  const password = overrides.password ?? DEFAULT_PASSWORD;
  const user = await User.create({
    email: overrides.email ?? `user-${randomUUID()}@example.test`,
    name: overrides.name ?? 'Test Person',
    passwordHash: await hashPassword(password),
    isSiteAdmin: overrides.isSiteAdmin ?? false,
    mayOrganise: overrides.mayOrganise ?? false,
    emailVerifiedAt: overrides.emailVerified === false ? null : new Date(),
  });
  return { user, password, email: user.email };
}

export const uniqueEmail = (label = 'user') => `${label}-${randomUUID()}@example.test`;
