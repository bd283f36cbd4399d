import { hasEventRole, type Actor } from './actor';
import { authorize } from './authorize';

export type JudgingAction = 'score' | 'viewOwnSheets' | 'assignJudges' | 'viewProgress' | 'closeJudging' | 'viewAllScores';
type EventRecord = { id: number; status: string };

/**
 * Judging: a judge scores and sees their own sheets while the show is being judged (whether it
 * still takes scores is the scoring service's rule, so the phone gets the reason); the
 * organisers assign judges, watch progress, close judging and see every score.
 */
export function canJudging(actor: Actor | null | undefined, action: JudgingAction, event: EventRecord): boolean {
  if (!actor) return false;
  const judge = hasEventRole(actor, event.id, 'judge');
  const organiser = hasEventRole(actor, event.id, 'organiser');
  switch (action) {
    case 'score':
      return judge;
    case 'viewOwnSheets':
      return judge && event.status === 'judging';
    case 'assignJudges':
    case 'viewProgress':
    case 'closeJudging':
    case 'viewAllScores':
      return organiser;
  }
}

export const authorizeJudging = (actor: Actor | null | undefined, action: JudgingAction, event: EventRecord) =>
  authorize(canJudging(actor, action, event), actor, action === 'viewOwnSheets' ? 'Your sheets open here while this show is being judged and you are one of its judges.' : 'You have no role in this show that allows that.');
