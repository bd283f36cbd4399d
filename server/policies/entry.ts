import { NotFoundError } from '../errors';
import { hasAnyEventRole, hasEventRole, type Actor } from './actor';
import { authorize } from './authorize';
import { mayTakePartInShows } from './event';

export type EntryAction = 'view' | 'withdraw' | 'acceptOffer' | 'pay' | 'manage' | 'viewOwnResults';
type EntryRecord = { ownerId: number; eventId: number };

/**
 * An entry: its owner sees it, withdraws it, pays its fee, accepts a waiting-list offer and reads
 * its own scores; the show's organisers see, withdraw and manage every entry of their show.
 */
export function canEntry(actor: Actor | null | undefined, action: EntryAction, entry: EntryRecord): boolean {
  if (!actor) return false;
  const owner = entry.ownerId === actor.id;
  const organiser = hasEventRole(actor, entry.eventId, 'organiser');
  switch (action) {
    case 'acceptOffer':
      return owner && mayTakePartInShows(actor);
    case 'pay': // the fee is the entrant's to pay; an organiser takes cash at the gate instead
      return owner;
    case 'manage': // changing class, marking paid, moving up: never the owner
      return organiser;
    case 'view':
    case 'withdraw':
    case 'viewOwnResults':
      return owner || organiser;
  }
}

const REFUSALS: Partial<Record<EntryAction, string>> = {
  acceptOffer: 'Confirm your e-mail address before accepting a place.',
  pay: 'The fee is the entrant’s to pay; the organisers take cash at the gate instead.',
  manage: 'Only the show’s organisers may do that with an entry.',
};

/**
 * As for shows: for someone who is neither the entrant nor has any role in its show the entry does
 * not exist (404, as for a missing one); anyone else who may not do this gets 403.
 */
export function authorizeEntry(actor: Actor | null | undefined, action: EntryAction, entry: EntryRecord): void {
  if (actor && entry.ownerId !== actor.id && !hasAnyEventRole(actor, entry.eventId)) throw new NotFoundError('No such entry.');
  authorize(canEntry(actor, action, entry), actor, REFUSALS[action]);
}
