import type { Migration } from '../migrator';
import { DEMO_ACCOUNTS } from '../demo-accounts';
import { User } from '../../models/user';
import { hashPassword } from '../../auth/passwords';

export const up: Migration = async () => {
  for (const a of DEMO_ACCOUNTS) {
    const existing = await User.findOne({ where: { email: a.email } });
    if (existing) continue;
    await User.create({ email: a.email, name: a.name, passwordHash: await hashPassword(a.password), isSiteAdmin: a.isSiteAdmin, mayOrganise: a.mayOrganise });
  }
};
