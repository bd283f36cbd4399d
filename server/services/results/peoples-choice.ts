import { createHmac } from 'node:crypto';
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { peoplesChoice } from '@shared/calc/results';
import { voteBursts } from '@shared/calc/vote-bursts';
import { VOTE_BURST_SHOWN, VOTING_STATUSES, votingOpen, type VotingLimits } from '@shared/schemas/peoples-choice';
import { sequelize } from '../../db/sequelize';
import { config } from '../../config';
import { ConflictError, NotFoundError } from '../../errors';
import { Event } from '../../models/event';
import { Vote } from '../../models/vote';
import { findEvent } from '../shows/events';
import { writeAudit } from '../audit/audit';
import { entriesOnShowNow } from '../entries/entries';
import { withTransaction } from '../../db/transaction';

/**
 * A keyed hash (HMAC-SHA256 with the server's secret, per show) of a voter's token or address.
 * Keyed, because the IPv4 space is small enough to hash whole: a plain digest of an address is no
 * secret. Per show, so one visitor's votes in two shows cannot be linked by their hashes.
 */
export function votingHash(kind: 'voter' | 'address', eventId: number, value: string): string {
  return createHmac('sha256', config.sessionSecret).update(`placard-${kind}\0${eventId}\0${value}`).digest('hex');
}

/** The organiser opens or closes the window; opening needs the show on the field (show day or judging). */
export async function setVotingWindow(eventId: number, open: boolean, person: { id: number }, outer?: Transaction): Promise<Event> {
  return withTransaction(outer, async (transaction) => {
    // FOR UPDATE: a vote holds the show's row FOR SHARE, so none is counted after the close commits.
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    if (open && !VOTING_STATUSES.includes(event.status)) throw new ConflictError('People’s choice voting opens on show day or while the show is being judged.');
    if (votingOpen(event) === open) return event;
    const before = { openedAt: event.peoplesChoiceOpenedAt, closedAt: event.peoplesChoiceClosedAt };
    const now = new Date();
    await event.update(open ? { peoplesChoiceOpenedAt: now, peoplesChoiceClosedAt: null } : { peoplesChoiceClosedAt: now }, { transaction });
    await writeAudit(
      { eventId, actorId: person.id, action: open ? 'peoples_choice_opened' : 'peoples_choice_closed', before, after: { openedAt: event.peoplesChoiceOpenedAt, closedAt: event.peoplesChoiceClosedAt } },
      transaction,
    );
    return event;
  });
}

export type VoteOutcome =
  | { ok: true; eventId: number; showSlug: string; entryNumber: number }
  | { ok: false; reason: 'not-entered' | 'closed' }
  | { ok: false; reason: 'twice'; eventId: number; votedNumber: number | null };

/**
 * One visitor's vote for the car with this public code, in the show named by its address (`show`, the
 * slug the page's form carries; a car can be in two shows at once, each with its own vote). A form
 * without one (an older page) votes in the car's first show that is taking votes. The token and the
 * address arrive raw and leave this function only as keyed hashes. Refusals are outcomes, not errors:
 * the page answers each in words.
 */
export async function castVote(input: { code: string; show?: string; voterToken: string; address: string }, outer?: Transaction): Promise<VoteOutcome> {
  return withTransaction(outer, async (transaction) => {
    const entries = await entriesOnShowNow(input.code, { slug: input.show, transaction });
    const entry = entries.find((e) => e.event && votingOpen(e.event)) ?? entries[0];
    if (!entry?.event) return { ok: false, reason: 'not-entered' };
    const event = await Event.findByPk(entry.eventId, { lock: transaction.LOCK.SHARE, transaction });
    if (!event || !votingOpen(event)) return { ok: false, reason: 'closed' };
    const voterHash = votingHash('voter', event.id, input.voterToken);
    const inserted = await sequelize.query(
      `INSERT INTO votes (event_id, entry_id, voter_hash, address_hash, created_at) VALUES (:eventId, :entryId, :voterHash, :addressHash, now())
       ON CONFLICT (event_id, voter_hash) DO NOTHING RETURNING id`,
      { replacements: { eventId: event.id, entryId: entry.id, voterHash, addressHash: votingHash('address', event.id, input.address) }, type: QueryTypes.SELECT, transaction },
    );
    if (inserted.length === 0) return { ok: false, reason: 'twice', eventId: event.id, votedNumber: await votedNumber(event.id, input.voterToken, transaction) };
    return { ok: true, eventId: event.id, showSlug: event.slug, entryNumber: entry.number! };
  });
}

/** The number of the car this visitor voted for in this show, or null. A voided vote still used up the visitor's vote. */
export async function votedNumber(eventId: number, voterToken: string, transaction?: Transaction): Promise<number | null> {
  const rows = await sequelize.query<{ number: number }>(
    `SELECT e.number FROM votes v JOIN entries e ON e.id = v.entry_id WHERE v.event_id = :eventId AND v.voter_hash = :voterHash`,
    { replacements: { eventId, voterHash: votingHash('voter', eventId, voterToken) }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0]?.number ?? null;
}

export type TallyRow = { entryId: number; number: number; title: string; className: string; votes: number };

/** Votes per car that can win (confirmed or checked in, with a number), voided votes left out; most votes first. */
export function loadTally(eventId: number, transaction?: Transaction): Promise<TallyRow[]> {
  return sequelize.query<TallyRow>(
    `SELECT e.id AS "entryId", e.number, b.title, c.name AS "className", count(v.id)::int AS votes
       FROM entries e
       JOIN builds b ON b.id = e.build_id
       JOIN event_classes c ON c.id = e.class_id
       LEFT JOIN votes v ON v.entry_id = e.id AND v.voided_at IS NULL
      WHERE e.event_id = :eventId AND e.number IS NOT NULL AND e.status IN ('confirmed', 'checked_in')
      GROUP BY e.id, b.title, c.name
      ORDER BY votes DESC, e.number`,
    { replacements: { eventId }, type: QueryTypes.SELECT, transaction },
  );
}

/** Each address (as its keyed hash) that voted in the show: its votes and how many of them are voided. */
export function loadAddresses(eventId: number) {
  return sequelize.query<{ addressHash: string; votes: number; voided: number }>(
    `SELECT address_hash AS "addressHash", count(*)::int AS votes, count(voided_at)::int AS voided
       FROM votes WHERE event_id = :eventId GROUP BY address_hash ORDER BY votes DESC, address_hash`,
    { replacements: { eventId }, type: QueryTypes.SELECT },
  );
}

/** Bursts of new voters from one address in the show (see `voteBursts`), newest first. */
export async function loadBursts(eventId: number) {
  const votes = await sequelize.query<{ addressHash: string; at: Date; voided: boolean }>(
    `SELECT address_hash AS "addressHash", created_at AS at, voided_at IS NOT NULL AS voided FROM votes WHERE event_id = :eventId`,
    { replacements: { eventId }, type: QueryTypes.SELECT },
  );
  return voteBursts(votes, { windowMs: VOTE_BURST_SHOWN.windowMinutes * 60_000, minVotes: VOTE_BURST_SHOWN.minVotes });
}

/** The limits in force, for the panel to say what they stop and what they cannot. */
export const votingLimits = (): VotingLimits => ({
  attempts: config.voteRateLimit,
  attemptsWindowMinutes: config.voteRateWindowMs / 60_000,
  newVoters: config.voteNewVoterLimit,
  newVotersWindowMinutes: config.voteNewVoterWindowMs / 60_000,
  burstFrom: VOTE_BURST_SHOWN.minVotes,
  burstWindowMinutes: VOTE_BURST_SHOWN.windowMinutes,
});

/** Everything the organiser's panel shows. */
export async function loadPeoplesChoice(eventId: number) {
  const event = await findEvent(eventId);
  const [tally, addresses, bursts] = await Promise.all([loadTally(eventId), loadAddresses(eventId), loadBursts(eventId)]);
  return { event, tally, addresses, bursts, leaders: peoplesChoice(tally).entryIds, limits: votingLimits() };
}

/**
 * Voids the counted votes of one burst: that address's votes from its first to its last vote (the times as
 * the panel got them, to the millisecond; stored times carry microseconds, hence the end's extra millisecond).
 * The address's votes outside the burst keep counting, so honest visitors on the same network are not voided.
 */
export async function voidVoteBurst(eventId: number, burst: { addressHash: string; from: Date; to: Date }, person: { id: number }, outer?: Transaction): Promise<number> {
  return withTransaction(outer, async (transaction) => {
    await findEvent(eventId, transaction);
    const until = new Date(burst.to.getTime() + 1);
    const [count] = await Vote.update(
      { voidedAt: new Date(), voidedBy: person.id },
      { where: { eventId, addressHash: burst.addressHash, voidedAt: null, createdAt: { [Op.gte]: burst.from, [Op.lt]: until } }, transaction },
    );
    if (count > 0) {
      const after = { addressHash: burst.addressHash, from: burst.from.toISOString(), to: burst.to.toISOString(), votes: count };
      await writeAudit({ eventId, actorId: person.id, action: 'peoples_choice_burst_voided', after }, transaction);
    }
    return count;
  });
}

/** Voids every counted vote from one address in the show (ballot stuffing from one network); the audit line says how many. */
export async function voidVotesOfAddress(eventId: number, addressHash: string, person: { id: number }, outer?: Transaction): Promise<number> {
  return withTransaction(outer, async (transaction) => {
    await findEvent(eventId, transaction);
    const [count] = await Vote.update({ voidedAt: new Date(), voidedBy: person.id }, { where: { eventId, addressHash, voidedAt: null }, transaction });
    if (count > 0) await writeAudit({ eventId, actorId: person.id, action: 'peoples_choice_votes_voided', after: { addressHash, votes: count } }, transaction);
    return count;
  });
}

/** The people's choice award: the entry ids with the most counted votes, ties shared; none without votes. */
export async function peoplesChoiceWinners(eventId: number, transaction?: Transaction): Promise<number[]> {
  return (await peoplesChoiceResult(eventId, transaction)).entryIds;
}

/** The winners and their vote count, as results publishing stores them. */
export async function peoplesChoiceResult(eventId: number, transaction?: Transaction): Promise<{ entryIds: number[]; votes: number }> {
  return peoplesChoice(await loadTally(eventId, transaction));
}
