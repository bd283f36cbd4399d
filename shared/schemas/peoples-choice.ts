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
});
export type PeoplesChoice = z.infer<typeof PeoplesChoiceSchema>;
