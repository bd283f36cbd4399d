import type { EventStatus } from '@shared/constants';
import { hasEventRole, type Actor } from './actor';
import { authorize } from './authorize';

export type EventAction = 'create' | 'view' | 'manage' | 'viewEntries' | 'printCards' | 'checkIn' | 'judge' | 'register';
type EventRecord = { id: number; status: EventStatus };

/** An unverified account can build and publish, but not register for a show or accept an invitation. */
export function mayTakePartInShows(actor: Actor | null | undefined): boolean {
  return Boolean(actor?.emailVerified);
}

const isOrganiser = (actor: Actor | null | undefined, event: EventRecord) => hasEventRole(actor, event.id, 'organiser');

/**
 * Shows: the may-organise flag creates one; everything else follows the person's role in that
 * show only (an organiser of one show has no say in another). Gate staff check in, judges judge.
 */
export function can(actor: Actor | null | undefined, action: EventAction, event?: EventRecord): boolean {
  if (!actor) return false;
  if (action === 'create') return actor.mayOrganise || actor.isSiteAdmin;
  if (!event) return false;
  switch (action) {
    case 'view':
      return isOrganiser(actor, event) || hasEventRole(actor, event.id, 'judge') || hasEventRole(actor, event.id, 'gate');
    case 'manage':
    case 'viewEntries':
    case 'printCards': // bulk numbered cards and their file: the show's organisers only
      return isOrganiser(actor, event);
    case 'checkIn':
      return (isOrganiser(actor, event) || hasEventRole(actor, event.id, 'gate')) && event.status === 'show_day';
    case 'judge':
      return hasEventRole(actor, event.id, 'judge') && event.status === 'judging';
    case 'register':
      // Whether the show takes entries now is the registration service's rule (a 409 naming the reason).
      return mayTakePartInShows(actor);
  }
}

export const authorizeEvent = (actor: Actor | null | undefined, action: EventAction, event?: EventRecord) =>
  authorize(can(actor, action, event), actor, action === 'create' ? 'Your account may not create shows; ask a site admin.' : 'You have no role in this show that allows that.');

/** What the client may offer for this show, so screens never re-implement the rules. */
export const eventAbilities = (actor: Actor | null | undefined, event: EventRecord) => ({
  manage: can(actor, 'manage', event),
  viewEntries: can(actor, 'viewEntries', event),
  checkIn: can(actor, 'checkIn', event),
  judge: can(actor, 'judge', event),
  register: can(actor, 'register', event) && event.status === 'registration_open',
});

/** An entry: its owner sees and withdraws it; the show's organisers see and withdraw every entry of their show. */
export type EntryAction = 'view' | 'withdraw' | 'acceptOffer' | 'pay' | 'manage';
export function canEntry(actor: Actor | null | undefined, action: EntryAction, entry: { ownerId: number; eventId: number }): boolean {
  if (!actor) return false;
  const owner = entry.ownerId === actor.id;
  if (action === 'acceptOffer') return owner && mayTakePartInShows(actor);
  // The fee is the entrant's to pay; an organiser takes cash at the gate instead.
  if (action === 'pay') return owner;
  // Changing class, marking paid, moving up: the show's organisers only, never the owner.
  if (action === 'manage') return hasEventRole(actor, entry.eventId, 'organiser');
  return owner || hasEventRole(actor, entry.eventId, 'organiser');
}
export const authorizeEntry = (actor: Actor | null | undefined, action: EntryAction, entry: { ownerId: number; eventId: number }) =>
  authorize(canEntry(actor, action, entry), actor, 'This entry is someone else’s.');
