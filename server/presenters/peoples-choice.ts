import { VOTING_STATUSES, votingOpen, type PeoplesChoice } from '@shared/schemas/peoples-choice';
import type { Event } from '../models/event';

type Loaded = {
  event: Event;
  tally: Array<{ entryId: number; number: number; title: string; className: string; votes: number }>;
  addresses: Array<{ addressHash: string; votes: number; voided: number }>;
  leaders: number[];
};

/** The organiser's view of the vote: the window, votes per car, and addresses as keyed hashes only. */
export function presentPeoplesChoice({ event, tally, addresses, leaders }: Loaded): PeoplesChoice {
  const total = addresses.reduce((n, a) => n + a.votes, 0);
  const voided = addresses.reduce((n, a) => n + a.voided, 0);
  return {
    open: votingOpen(event),
    mayOpen: VOTING_STATUSES.includes(event.status),
    openedAt: event.peoplesChoiceOpenedAt?.toISOString() ?? null,
    closedAt: event.peoplesChoiceClosedAt?.toISOString() ?? null,
    totalVotes: total - voided,
    voidedVotes: voided,
    tally: tally.map((t) => ({ entryId: t.entryId, number: t.number, title: t.title, className: t.className, votes: t.votes })),
    addresses: addresses.map((a) => ({ addressHash: a.addressHash, votes: a.votes, voided: a.voided })),
    leaders,
  };
}
