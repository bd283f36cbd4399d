import type { EventStatus } from '@shared/constants';
import { NotFoundError } from '../errors';
import { hasAnyEventRole, hasEventRole, type Actor } from './actor';
import { authorize } from './authorize';

/**
 * Everything a person may do with a show, in one list: running it, its show day, its judging, its
 * results and its people's choice. Routes ask through `loadEventFor(req, action)`.
 */
export type EventAction =
  | 'create'
  | 'view'
  | 'manage'
  | 'viewEntries'
  | 'printCards'
  | 'checkIn'
  | 'register'
  | 'score'
  | 'viewOwnSheets'
  | 'assignJudges'
  | 'viewProgress'
  | 'closeJudging'
  | 'viewAllScores'
  | 'manageResults'
  | 'managePeoplesChoice';
type EventRecord = { id: number; status: EventStatus | string };

/** An unverified account can build and publish, but not register for a show or accept an invitation. */
export function mayTakePartInShows(actor: Actor | null | undefined): boolean {
  return Boolean(actor?.emailVerified);
}

/** Actions anyone signed in may ask for without a role in the show (the answer is theirs to see). */
const NEEDS_NO_ROLE: ReadonlySet<EventAction> = new Set(['create', 'register']);

/**
 * The may-organise flag creates a show; everything else follows the person's role in that show
 * only (an organiser of one show has no say in another, a site admin none in any). Gate staff
 * check in on show day and, for late arrivals, while the show is judged; judges score and see their own sheets while the show is being judged
 * (whether it still takes scores is the scoring service's rule, so the phone gets the reason);
 * the organisers do the rest.
 */
export function canEvent(actor: Actor | null | undefined, action: EventAction, event?: EventRecord): boolean {
  if (!actor) return false;
  if (action === 'create') return actor.mayOrganise || actor.isSiteAdmin;
  if (!event) return false;
  const organiser = hasEventRole(actor, event.id, 'organiser');
  const judge = hasEventRole(actor, event.id, 'judge');
  const gate = hasEventRole(actor, event.id, 'gate');
  switch (action) {
    case 'view':
      return organiser || judge || gate;
    case 'manage':
    case 'viewEntries':
    case 'printCards': // bulk numbered cards and their file
    case 'assignJudges':
    case 'viewProgress':
    case 'closeJudging':
    case 'viewAllScores':
    case 'manageResults':
    case 'managePeoplesChoice':
      return organiser;
    case 'checkIn':
      // Judging does not close the gate: a late arrival checked in then joins the judges' lists.
      return (organiser || gate) && (event.status === 'show_day' || event.status === 'judging');
    case 'score':
      return judge;
    case 'viewOwnSheets':
      return judge && event.status === 'judging';
    case 'register':
      // Whether the show takes entries now is the registration service's rule (a 409 naming the reason).
      return mayTakePartInShows(actor);
  }
}

const REFUSALS: Partial<Record<EventAction, string>> = {
  create: 'Your account may not create shows; ask a site admin.',
  register: 'Confirm your e-mail address before entering a show.',
  viewOwnSheets: 'Your sheets open here while this show is being judged and you are one of its judges.',
  managePeoplesChoice: 'Only the show’s organisers run people’s choice voting.',
};

/**
 * 401 for nobody; for someone with no role in the show, 404 exactly as for a show that does not
 * exist, so ids cannot be probed; 403 with the reason for someone in the show who may not do this.
 */
export function authorizeEvent(actor: Actor | null | undefined, action: EventAction, event?: EventRecord): void {
  if (actor && event && !NEEDS_NO_ROLE.has(action) && !hasAnyEventRole(actor, event.id)) throw new NotFoundError('No such show.');
  authorize(canEvent(actor, action, event), actor, REFUSALS[action] ?? 'You have no role in this show that allows that.');
}

/** What the client may offer for this show, so screens never re-implement the rules. */
export const eventAbilities = (actor: Actor | null | undefined, event: EventRecord) => ({
  manage: canEvent(actor, 'manage', event),
  viewEntries: canEvent(actor, 'viewEntries', event),
  checkIn: canEvent(actor, 'checkIn', event),
  judge: canEvent(actor, 'viewOwnSheets', event),
  register: canEvent(actor, 'register', event) && event.status === 'registration_open',
});
