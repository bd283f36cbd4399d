import { hasEventRole, type Actor } from './actor';
import { authorize } from './authorize';

export type PeoplesChoiceAction = 'manage';

/** The show's organisers open and close voting, read the tally and void an address's votes; nobody else sees votes. */
export function canPeoplesChoice(actor: Actor | null | undefined, action: PeoplesChoiceAction, event: { id: number }): boolean {
  if (!actor) return false;
  switch (action) {
    case 'manage':
      return hasEventRole(actor, event.id, 'organiser');
  }
}

export const authorizePeoplesChoice = (actor: Actor | null | undefined, action: PeoplesChoiceAction, event: { id: number }) =>
  authorize(canPeoplesChoice(actor, action, event), actor, 'Only the show’s organisers run people’s choice voting.');
