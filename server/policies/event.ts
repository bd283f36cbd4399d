import type { Actor } from './actor';
import { authorize } from './authorize';

/** Events arrive with their issue; creating one is already decided by the site-wide may-organise flag. */
export function can(actor: Actor | null | undefined, action: 'create'): boolean {
  return action === 'create' && Boolean(actor && (actor.mayOrganise || actor.isSiteAdmin));
}

export const authorizeEvent = (actor: Actor | null | undefined, action: 'create') => authorize(can(actor, action), actor);
