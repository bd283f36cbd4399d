import type { AdminUser, AdminUserDetail, CurrentUser } from '@shared/schemas/user';
import type { User } from '../models/user';
import { can as canUser } from '../policies/user';
import { can as canMail } from '../policies/mail';
import { canEvent } from '../policies/event';
import { config } from '../config';

/** The signed-in person as their own client sees them, with what the policies allow. */
export function presentCurrentUser(user: User): CurrentUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    hometown: user.hometown ?? '',
    club: user.club ?? '',
    isSiteAdmin: user.isSiteAdmin,
    mayOrganise: user.mayOrganise,
    emailVerified: user.emailVerified,
    abilities: {
      manageAccounts: canUser(user, 'list'),
      readCaughtMail: canMail(user, 'read', { demoMode: config.demoMode }),
      createEvents: canEvent(user, 'create'),
    },
  };
}

/** An account row in the site admin's list. */
export function presentAdminUser(user: User): AdminUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    isSiteAdmin: user.isSiteAdmin,
    mayOrganise: user.mayOrganise,
    createdAt: user.createdAt.toISOString(),
    disabledAt: user.disabledAt?.toISOString() ?? null,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
  };
}

/** One account as the site admin opens it: the row and its builds (titles and public addresses only). */
export function presentAdminUserDetail(user: User, builds: ReadonlyArray<{ id: number; title: string; published: boolean; code: string; updatedAt: Date }>): AdminUserDetail {
  return {
    user: presentAdminUser(user),
    builds: builds.map((b) => ({ id: b.id, title: b.title, published: b.published, publicUrl: `${config.publicBaseUrl}/c/${b.code}`, updatedAt: b.updatedAt.toISOString() })),
  };
}
