import { hasEventRole, type Actor } from './actor';
import { authorize } from './authorize';

export type ResultsAction = 'manageResults' | 'viewOwnResults';

/**
 * Results: the show's organisers set the rules, order ties by hand, publish, print and export;
 * a car's owner (and the organisers) read that car's own scores, once the results are published.
 */
export function canResults(actor: Actor | null | undefined, action: ResultsAction, record: { eventId: number; ownerId?: number }): boolean {
  if (!actor) return false;
  const organiser = hasEventRole(actor, record.eventId, 'organiser');
  if (action === 'manageResults') return organiser;
  return organiser || record.ownerId === actor.id;
}

export const authorizeResults = (actor: Actor | null | undefined, action: ResultsAction, record: { eventId: number; ownerId?: number }) =>
  authorize(canResults(actor, action, record), actor, action === 'viewOwnResults' ? 'This entry is someone else’s.' : 'You have no role in this show that allows that.');
