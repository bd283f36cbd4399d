import type { Actor } from './actor';
import { authorize } from './authorize';

export type UserAction = 'list' | 'updateRoles' | 'disable' | 'sendReset' | 'viewAccount' | 'updateAccount';

/** Accounts: each person manages their own; the site admin lists everyone and grants roles. */
export function can(actor: Actor | null | undefined, action: UserAction, target?: { id: number }): boolean {
  if (!actor) return false;
  switch (action) {
    case 'list':
      return actor.isSiteAdmin;
    case 'updateRoles':
      // An admin may not take away their own admin flag by accident; that check lives in the service.
      return actor.isSiteAdmin && target !== undefined;
    case 'disable':
      // Never oneself: an admin who locks themselves out needs another admin to get back in.
      return actor.isSiteAdmin && target !== undefined && target.id !== actor.id;
    case 'sendReset':
      return actor.isSiteAdmin && target !== undefined;
    case 'viewAccount':
    case 'updateAccount':
      return target !== undefined && (actor.id === target.id || actor.isSiteAdmin);
  }
}

export const authorizeUser = (actor: Actor | null | undefined, action: UserAction, target?: { id: number }) =>
  authorize(can(actor, action, target), actor);
