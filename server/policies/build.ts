import type { Actor } from './actor';
import { authorize } from './authorize';

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

export const authorizeBuild = (actor: Actor | null | undefined, action: BuildAction | 'create', build?: BuildRecord) =>
  authorize(can(actor, action, build), actor, 'This build belongs to someone else.');

export const buildAbilities = (actor: Actor | null | undefined, build: BuildRecord) => ({
  edit: can(actor, 'edit', build),
  delete: can(actor, 'delete', build),
  publish: can(actor, 'publish', build),
});
