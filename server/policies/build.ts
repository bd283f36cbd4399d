import type { Actor } from './actor';
import { authorize } from './authorize';
import { NotFoundError } from '../errors';

export type BuildAction = 'view' | 'edit' | 'delete' | 'publish' | 'viewPrivate';
type BuildRecord = { ownerId: number; published: boolean };

/**
 * Builds belong to their owner, who alone edits, publishes and deletes them.
 * Private fields: the owner now; organisers of a show the build is entered in, when events arrive
 * (through hasEventRole on the entry's event).
 */
export function can(actor: Actor | null | undefined, action: BuildAction | 'create', build?: BuildRecord): boolean {
  if (!actor) return false;
  if (action === 'create') return true;
  if (!build) return false;
  return build.ownerId === actor.id;
}

/** Anyone, signed in or not, may read a published build's public face, unless a site admin disabled its owner. */
export const canViewPublic = (build: Pick<BuildRecord, 'published'> | null | undefined, owner: { disabledAt: Date | null } | null | undefined) =>
  Boolean(build?.published && owner && !owner.disabledAt);

/**
 * Someone signed in who may not even see a build is told it does not exist (404), exactly as for a
 * missing one, so ids cannot be probed for which builds exist; one who may see it but not do this gets 403.
 */
export function authorizeBuild(actor: Actor | null | undefined, action: BuildAction | 'create', build?: BuildRecord): void {
  if (actor && build && !can(actor, 'view', build)) throw new NotFoundError('No such build.');
  authorize(can(actor, action, build), actor, 'You may not do that with this build.');
}

export const buildAbilities = (actor: Actor | null | undefined, build: BuildRecord) => ({
  viewPrivate: can(actor, 'viewPrivate', build),
  edit: can(actor, 'edit', build),
  delete: can(actor, 'delete', build),
  publish: can(actor, 'publish', build),
});
