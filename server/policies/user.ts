import type { Actor } from './actor';
import { authorize } from './authorize';

export type UserAction = 'list' | 'updateRoles' | 'viewAccount' | 'updateAccount';

/** Accounts: each person manages their own; the site admin lists everyone and grants roles. */
export function can(actor: Actor | null | undefined, action: UserAction, target?: { id: number }): boolean {
  if (!actor) return false;
  switch (action) {
    case 'list':
      return actor.isSiteAdmin;
    case 'updateRoles':
      // An admin may not take away their own admin flag by accident; that check lives in the service.
      return actor.isSiteAdmin && target !== undefined;
    case 'viewAccount':
    case 'updateAccount':
      return target !== undefined && (actor.id === target.id || actor.isSiteAdmin);
  }
}

export const authorizeUser = (actor: Actor | null | undefined, action: UserAction, target?: { id: number }) =>
  authorize(can(actor, action, target), actor);
