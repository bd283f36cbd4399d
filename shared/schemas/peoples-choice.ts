import { z } from 'zod';
import type { EventStatus } from '../constants';

/**
 * Visitors vote while the show is on the field: on show day and while it is being judged. Before
 * that the cars are not there to see; once results are published the award is decided.
 */
export const VOTING_STATUSES: readonly EventStatus[] = ['show_day', 'judging'];

/** The window as stored on the show: open while it has been opened and not closed since. */
export type VotingWindow = { status: EventStatus; peoplesChoiceOpenedAt: Date | string | null; peoplesChoiceClosedAt: Date | string | null };
export const votingOpen = (w: VotingWindow) => VOTING_STATUSES.includes(w.status) && w.peoplesChoiceOpenedAt !== null && w.peoplesChoiceClosedAt === null;

/** How many characters of an address hash the organiser sees: enough to tell addresses apart, no more. */
export const ADDRESS_HASH_SHOWN = 10;

/** An address as the organiser names it when voiding its votes: the full keyed hash from the tally. */
export const VoidAddressSchema = z.object({
  addressHash: z.string({ error: 'Pick an address from the list.' }).regex(/^[0-9a-f]{64}$/, { error: 'Pick an address from the list.' }),
});
export type VoidAddressInput = z.infer<typeof VoidAddressSchema>;

/** A burst as the organiser names it when voiding it: the address's hash and the first and last vote's times from the list. */
export const VoidBurstSchema = z
  .object({
    addressHash: z.string({ error: 'Pick a burst from the list.' }).regex(/^[0-9a-f]{64}$/, { error: 'Pick a burst from the list.' }),
    from: z.iso.datetime({ error: 'The start of the burst must be a date and time.' }),
    to: z.iso.datetime({ error: 'The end of the burst must be a date and time.' }),
  })
  .refine((b) => Date.parse(b.to) >= Date.parse(b.from), { path: ['to'], error: 'The end of the burst comes after its start.' });
export type VoidBurstInput = z.infer<typeof VoidBurstSchema>;

/** What holds back one address: attempts, and new voters, per window; and from how many new voters a burst is shown. */
export const VotingLimitsSchema = z.object({
  attempts: z.number().int(),
  attemptsWindowMinutes: z.number().int(),
  newVoters: z.number().int(),
  newVotersWindowMinutes: z.number().int(),
  burstFrom: z.number().int(),
  burstWindowMinutes: z.number().int(),
});
export type VotingLimits = z.infer<typeof VotingLimitsSchema>;

/** The bursts shown to the organiser: this many new voters from one address within this many minutes. */
export const VOTE_BURST_SHOWN = { minVotes: 5, windowMinutes: 10 } as const;

/** The panel's plain words on what the limits stop and what they cannot: one source, read by the panel and its test. */
export function votingLimitsExplained(l: VotingLimits): { stops: string[]; cannotStop: string[] } {
  return {
    stops: [
      `One address gets at most ${l.attempts} vote attempts every ${l.attemptsWindowMinutes} minutes, refused ones included.`,
      `One address gets at most ${l.newVoters} counted votes every ${l.newVotersWindowMinutes} minutes, however often its cookies are cleared; more wait until the window passes.`,
      `From ${l.burstFrom} new voters on one address within ${l.burstWindowMinutes} minutes, the votes show below as a burst you can void on its own, leaving that address’s other votes counted.`,
    ],
    cannotStop: [
      'Someone who changes network (phone data, another Wi-Fi) counts as a new address.',
      'A burst can be honest: a crowd on the show’s Wi-Fi voting after an announcement looks the same. Look before you void.',
      'Votes spread out slowly from one address stay under every limit and do not show as a burst.',
    ],
  };
}

export const PeoplesChoiceSchema = z.object({
  open: z.boolean(),
  /** Whether the show's status lets the window open at all (show day or judging). */
  mayOpen: z.boolean(),
  openedAt: z.string().nullable(),
  closedAt: z.string().nullable(),
  totalVotes: z.number().int(),
  voidedVotes: z.number().int(),
  /** Every car that can be voted for, most votes first, then by number. */
  tally: z.array(z.object({ entryId: z.number().int(), number: z.number().int(), title: z.string(), className: z.string(), votes: z.number().int() })),
  /** Addresses that voted, most votes first: the keyed hash, never the address. */
  addresses: z.array(z.object({ addressHash: z.string(), votes: z.number().int(), voided: z.number().int() })),
  /** The car or cars with the most votes (ties shared); empty with no votes. */
  leaders: z.array(z.number().int()),
  /** Bursts of new voters from one address, newest first: the address's keyed hash, first and last vote, votes and voided. */
  bursts: z.array(z.object({ addressHash: z.string(), from: z.string(), to: z.string(), votes: z.number().int(), voided: z.number().int() })),
  limits: VotingLimitsSchema,
});
export type PeoplesChoice = z.infer<typeof PeoplesChoiceSchema>;
