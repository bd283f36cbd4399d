import { VOTING_STATUSES, votingOpen, type PeoplesChoice, type VotingLimits } from '@shared/schemas/peoples-choice';
import type { Event } from '../models/event';

type Loaded = {
  event: Event;
  tally: Array<{ entryId: number; number: number; title: string; className: string; votes: number }>;
  addresses: Array<{ addressHash: string; votes: number; voided: number }>;
  leaders: number[];
  bursts: Array<{ addressHash: string; from: Date; to: Date; votes: number; voided: number }>;
  limits: VotingLimits;
};

/** The organiser's view of the vote: the window, votes per car, and addresses as keyed hashes only. */
export function presentPeoplesChoice({ event, tally, addresses, leaders, bursts, limits }: Loaded): PeoplesChoice {
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
    bursts: bursts.map((b) => ({ addressHash: b.addressHash, from: b.from.toISOString(), to: b.to.toISOString(), votes: b.votes, voided: b.voided })),
    limits: {
      attempts: limits.attempts,
      attemptsWindowMinutes: limits.attemptsWindowMinutes,
      newVoters: limits.newVoters,
      newVotersWindowMinutes: limits.newVotersWindowMinutes,
      burstFrom: limits.burstFrom,
      burstWindowMinutes: limits.burstWindowMinutes,
    },
  };
}
