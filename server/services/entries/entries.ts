import { ASKABLE_PRIVATE_FIELD_WORDS } from '@shared/constants';
import { listInWords } from '@shared/words';
import { Op, type Transaction } from 'sequelize';
import { EVENT_OVER_STATUSES, ENTRY_PLACE_STATUSES, type EntryStatus } from '@shared/constants';
import { refundDue } from '@shared/calc/refund';
import type { EntryCreateInput } from '@shared/schemas/entry';
import { sequelize } from '../../db/sequelize';
import { withTransaction } from '../../db/transaction';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { queueEntryRefund } from './entry-refunds';
import { mailEntryReceived, mailPaymentConfirmed, mailWithdrawn } from './entry-mail';
import { hasRoom, lapseExpiredOffers, offerFreedPlaces, settleOffers } from './waitlist';

type Person = { id: number };

const lockEvent = async (eventId: number, transaction: Transaction) => {
  const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
  if (!event) throw new NotFoundError('No such show.');
  return event;
};

/** The next entry number, taken while the show's row is locked: no gaps, no twins. */
export async function takeNumber(event: Event, transaction: Transaction): Promise<number> {
  const number = event.lastEntryNumber + 1;
  await event.update({ lastEntryNumber: number }, { transaction });
  return number;
}

const statusWithPlace = (event: Event): EntryStatus => (event.entryFee > 0 ? 'awaiting_payment' : 'confirmed');

/**
 * An owner enters one of their published builds in a class. A free place gives a number at
 * once (confirmed when the show is free, else awaiting payment); a full class or show puts the
 * entry on the waiting list, in order.
 */
export async function registerEntry(person: Person, eventId: number, input: EntryCreateInput, now = new Date(), outer?: Transaction): Promise<Entry> {
  return withTransaction(outer, async (transaction) => {
    const event = await lockEvent(eventId, transaction);
    if (event.status !== 'registration_open') throw new ConflictError('This show is not taking entries.', { eventId: 'Entries are not open for this show.' });
    if (now < event.registrationOpensAt) throw new ConflictError('Entries have not opened yet.', { eventId: `Entries open on ${event.registrationOpensAt.toISOString()}.` });
    if (now >= event.registrationClosesAt) throw new ConflictError('Entries have closed.', { eventId: 'The registration window has closed.' });
    const cls = await EventClass.findOne({ where: { id: input.classId, eventId }, transaction });
    if (!cls) throw new ValidationError({ classId: 'This show has no such class.' });
    const build = await Build.findByPk(input.buildId, { attributes: ['id', 'ownerId', 'published', 'title'], transaction });
    // Someone else's build is answered as a missing one, so build ids cannot be probed through entering.
    if (!build || build.ownerId !== person.id) throw new ValidationError({ buildId: 'No such build.' });
    if (!build.published) throw new ValidationError({ buildId: 'Publish the build sheet before entering it in a show.' });
    const notAgreed = event.asksFor.filter((field) => !input.shares.includes(field));
    if (notAgreed.length) throw new ValidationError({ shares: `This show asks for your ${listInWords(notAgreed.map((f) => ASKABLE_PRIVATE_FIELD_WORDS[f]))} on its entry form: agree to share it with the organisers to enter.` });
    const existing = await Entry.findOne({ where: { eventId, buildId: build.id }, transaction });
    if (existing) throw new ConflictError('This build is already entered in this show.', { buildId: existing.status === 'withdrawn' ? 'This build was entered and withdrawn; a build enters a show once.' : 'Already entered in this show.' });

    await lapseExpiredOffers(eventId, transaction, now);
    const room = await hasRoom(event, cls.id, now, transaction);
    const entry = await Entry.create(
      {
        eventId,
        buildId: build.id,
        classId: cls.id,
        ownerId: person.id,
        number: room ? await takeNumber(event, transaction) : null,
        status: room ? statusWithPlace(event) : 'waiting_list',
        feeAmount: event.entryFee,
        currency: event.currency,
        waitlistedAt: room ? null : now,
        sharedFields: [...event.asksFor],
      },
      { transaction },
    );
    await writeAudit({ eventId, entryId: entry.id, actorId: person.id, action: 'entry_created', after: { status: entry.status, number: entry.number, classId: cls.id } }, transaction);
    await mailEntryReceived(entry, event, transaction);
    return entry;
  });
}

/** The waiting-list entrant takes the place offered, before its deadline. */
export async function acceptOffer(entryId: number, person: Person, now = new Date(), outer?: Transaction): Promise<Entry> {
  const entry0 = await findEntry(entryId);
  await settleOffers(entry0.eventId, now);
  return withTransaction(outer, async (transaction) => {
    const event = await lockEvent(entry0.eventId, transaction);
    const entry = await Entry.findByPk(entryId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!entry || entry.ownerId !== person.id) throw new NotFoundError('No such entry.');
    if (entry.status !== 'waiting_list' || !entry.offerExpiresAt) throw new ConflictError('There is no place on offer for this entry.', { entryId: 'No open offer.' });
    if (entry.offerExpiresAt <= now) throw new ConflictError('The offer has lapsed.', { entryId: 'The offer has lapsed.' });
    const before = { status: entry.status, number: entry.number };
    await entry.update({ status: statusWithPlace(event), number: await takeNumber(event, transaction), offerExpiresAt: null, waitlistedAt: null }, { transaction });
    await writeAudit({ eventId: event.id, entryId, actorId: person.id, action: 'offer_accepted', before, after: { status: entry.status, number: entry.number } }, transaction);
    await mailEntryReceived(entry, event, transaction);
    return entry;
  });
}

/** What the show's refund rule gives back for this entry if it is withdrawn at `at` (minor units). */
export const refundAmountFor = (entry: Pick<Entry, 'paidAmount'>, event: Pick<Event, 'refundRule'>, at = new Date()) => refundDue(entry.paidAmount ?? 0, event.refundRule, at);

/**
 * Withdrawal by the owner or an organiser: the entry keeps its number (no reuse), records the
 * refund the show's rule gives, and the place it held goes to the first in line.
 */
export async function withdrawEntry(entryId: number, person: Person, byOrganiser: boolean, now = new Date(), outer?: Transaction): Promise<Entry> {
  const entry0 = await findEntry(entryId);
  return withTransaction(outer, async (transaction) => {
    const event = await lockEvent(entry0.eventId, transaction);
    const entry = await Entry.findByPk(entryId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!entry) throw new NotFoundError('No such entry.');
    if (entry.status === 'withdrawn') throw new ConflictError('This entry is already withdrawn.');
    if (EVENT_OVER_STATUSES.includes(event.status)) throw new ConflictError('The show is over; its entries stay as they were.');
    const heldPlace = ENTRY_PLACE_STATUSES.includes(entry.status) || (entry.status === 'waiting_list' && entry.offerExpiresAt !== null && entry.offerExpiresAt > now);
    const before = { status: entry.status, refundDue: entry.refundDue };
    const refund = entry.paidAmount ? refundAmountFor(entry, event, now) : null;
    await entry.update({ status: 'withdrawn', withdrawnAt: now, refundDue: refund, offerExpiresAt: null }, { transaction });
    await writeAudit({ eventId: event.id, entryId, actorId: person.id, action: byOrganiser ? 'withdrawn_by_organiser' : 'withdrawn_by_owner', before, after: { status: 'withdrawn', refundDue: refund } }, transaction);
    await mailWithdrawn(entry, event, byOrganiser, transaction);
    if (refund) await queueEntryRefund(entry, refund, transaction);
    if (heldPlace) await offerFreedPlaces(event.id, transaction, now);
    return entry;
  });
}

/**
 * The payments side calls this when the fee is in: an entry awaiting payment becomes confirmed.
 * Idempotent: the same reference again changes nothing. A payment for an entry that no longer
 * awaits one (withdrawn meanwhile) is recorded without changing its status, so it can be refunded.
 */
export async function confirmEntryPayment(
  entryId: number,
  paymentRef: string,
  opts: { amount?: number; paidAt?: Date; actorId?: number | null; transaction?: Transaction } = {},
): Promise<{ entry: Entry; changed: boolean }> {
  const run = async (transaction: Transaction) => {
    const entry0 = await Entry.findByPk(entryId, { transaction });
    if (!entry0) throw new NotFoundError('No such entry.');
    const event = await lockEvent(entry0.eventId, transaction);
    const entry = (await Entry.findByPk(entryId, { lock: transaction.LOCK.UPDATE, transaction }))!;
    if (entry.paymentRef === paymentRef && entry.paidAt) return { entry, changed: false };
    if (entry.paidAt && entry.paymentRef !== paymentRef) throw new AppError(409, 'CONFLICT', 'This entry is already paid under another payment reference.');
    const paid = { paymentRef, paidAt: opts.paidAt ?? new Date(), paidAmount: opts.amount ?? entry.feeAmount };
    const before = { status: entry.status, paymentRef: entry.paymentRef };
    const confirm = entry.status === 'awaiting_payment';
    await entry.update({ ...paid, ...(confirm ? { status: 'confirmed' as const } : {}) }, { transaction });
    await writeAudit({ eventId: entry.eventId, entryId, actorId: opts.actorId ?? null, action: confirm ? 'payment_confirmed' : 'payment_recorded', before, after: { status: entry.status, paymentRef, paidAmount: paid.paidAmount } }, transaction);
    if (confirm) await mailPaymentConfirmed(entry, event, transaction);
    return { entry, changed: true };
  };
  return opts.transaction ? run(opts.transaction) : sequelize.transaction(run);
}

export async function findEntry(id: number): Promise<Entry> {
  const entry = await Entry.findByPk(id);
  if (!entry) throw new NotFoundError('No such entry.');
  return entry;
}

const entryIncludes = [
  { model: Build, as: 'build', attributes: ['id', 'title', 'code', 'published'] },
  { model: EventClass, as: 'eventClass', attributes: ['id', 'name', 'position'] },
];

/** Place in line of each waiting entry of these shows (1 = next to be offered). */
async function waitingPositions(eventIds: number[]): Promise<Map<number, number>> {
  const waiting = eventIds.length ? await Entry.findAll({ where: { eventId: { [Op.in]: eventIds }, status: 'waiting_list' }, attributes: ['id', 'eventId'], order: [['waitlistedAt', 'ASC'], ['id', 'ASC']] }) : [];
  const positions = new Map<number, number>();
  const counters = new Map<number, number>();
  for (const w of waiting) {
    const n = (counters.get(w.eventId) ?? 0) + 1;
    counters.set(w.eventId, n);
    positions.set(w.id, n);
  }
  return positions;
}

/** Every entry of a show for its organisers, by number, then the waiting list in order. */
export async function listEntriesOfEvent(eventId: number) {
  const entries = await Entry.findAll({
    where: { eventId },
    include: [...entryIncludes, { model: User, as: 'owner', attributes: ['id', 'name'] }],
    order: [[sequelize.literal('"Entry"."number" IS NULL'), 'ASC'], ['number', 'ASC'], ['waitlistedAt', 'ASC'], ['id', 'ASC']],
  });
  return { entries, positions: await waitingPositions([eventId]) };
}

const SHOW_OVER = new Set(['results_published', 'archived']);

/** An owner's entries across shows: shows still to come or on today first, the soonest first; then the shows that are over, the latest first. */
export async function listEntriesOf(person: Person) {
  const eventIds = (await Entry.findAll({ where: { ownerId: person.id }, attributes: ['eventId'], group: ['eventId'] })).map((r) => r.eventId);
  const entries = await Entry.findAll({
    where: { ownerId: person.id },
    include: [...entryIncludes, { model: Event, as: 'event' }],
    order: [[{ model: Event, as: 'event' }, 'startsAt', 'ASC'], ['id', 'ASC']],
  });
  const over = (e: Entry) => SHOW_OVER.has(e.event!.status);
  // Array sort is stable: among one show's entries the query's order (by entry) stands.
  const ordered = [...entries.filter((e) => !over(e)), ...entries.filter(over).sort((a, b) => b.event!.startsAt.getTime() - a.event!.startsAt.getTime())];
  return { entries: ordered, positions: await waitingPositions(eventIds) };
}

/** The show's public entry list: confirmed entries of published builds, by number (no owners' details). */
export function listPublicEntries(eventId: number) {
  return Entry.findAll({
    where: { eventId, status: { [Op.in]: ['confirmed', 'checked_in'] }, number: { [Op.ne]: null } },
    include: [{ model: Build, as: 'build', attributes: ['id', 'title', 'code', 'published'], where: { published: true } }],
    attributes: ['id', 'classId', 'buildId', 'number', 'status'],
    order: [['number', 'ASC']],
  });
}

/** Why a build cannot be deleted now: an entry in a show that is not over. Null when it can. */
export async function blockingEntryOf(buildId: number, transaction?: Transaction): Promise<string | null> {
  const entry = await Entry.findOne({
    where: { buildId, status: { [Op.ne]: 'withdrawn' } },
    include: [{ model: Event, as: 'event', attributes: ['name', 'status'], where: { status: { [Op.notIn]: [...EVENT_OVER_STATUSES] } } }],
    transaction,
  });
  return entry?.event ? entry.event.name : null;
}

/** While a show is on, a car's public page names the show it is entered in. */
const ON_STATUSES = ['registration_open', 'registration_closed', 'show_day', 'judging'] as const;

/**
 * The entry that puts a build on a show right now (confirmed or checked in, the earliest show first):
 * the one its public page names, and the one a people's choice vote on that page goes to.
 */
/**
 * Every show a build is in right now (confirmed or checked in, with a number), soonest first; with
 * `slug`, only that show's entry. A car may be in two current shows, and each takes its own votes.
 */
export function entriesOnShowNow(code: string, opts: { slug?: string; transaction?: Transaction } = {}): Promise<Entry[]> {
  return Entry.findAll({
    where: { status: { [Op.in]: ['confirmed', 'checked_in'] }, number: { [Op.ne]: null } },
    include: [
      { model: Build, as: 'build', attributes: ['id'], where: { code, published: true } },
      {
        model: Event,
        as: 'event',
        attributes: ['id', 'name', 'slug', 'startsAt', 'status', 'peoplesChoiceOpenedAt', 'peoplesChoiceClosedAt'],
        where: { status: { [Op.in]: [...ON_STATUSES] }, ...(opts.slug ? { slug: opts.slug } : {}) },
      },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
    order: [
      [{ model: Event, as: 'event' }, 'startsAt', 'ASC'],
      [{ model: Event, as: 'event' }, 'id', 'ASC'],
    ],
    transaction: opts.transaction,
  });
}
