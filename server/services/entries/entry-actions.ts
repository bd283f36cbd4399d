import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { ENTRY_PLACE_STATUSES, EVENT_OVER_STATUSES } from '@shared/constants';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { mailEntryReceived, mailPaymentConfirmed } from './entry-mail';
import { hasRoom, offerFreedPlaces } from './waitlist';
import { withTransaction } from '../../db/transaction';
import { expireCheckoutPaidElsewhere } from './entry-payments';

type Person = { id: number };

/** Locks the show, then the entry (the same order as registration, so the two never deadlock). */
async function lockEntry(entryId: number, transaction: Transaction) {
  const first = await Entry.findByPk(entryId, { attributes: ['id', 'eventId'], transaction });
  if (!first) throw new NotFoundError('No such entry.');
  const event = await Event.findByPk(first.eventId, { lock: transaction.LOCK.UPDATE, transaction });
  const entry = await Entry.findByPk(entryId, { lock: transaction.LOCK.UPDATE, transaction });
  if (!event || !entry) throw new NotFoundError('No such entry.');
  if (EVENT_OVER_STATUSES.includes(event.status)) throw new ConflictError('The show is over; its entries stay as they were.');
  return { event, entry };
}

/**
 * The organiser moves an entry to another class of the same show. A class that is full refuses
 * an entry holding a place (the waiting list is the way in); a waiting entry just changes line.
 */
export async function changeEntryClass(entryId: number, classId: number, person: Person, now = new Date(), outer?: Transaction): Promise<Entry> {
  return withTransaction(outer, async (transaction) => {
    const { event, entry } = await lockEntry(entryId, transaction);
    if (entry.status === 'withdrawn') throw new ConflictError('A withdrawn entry keeps its class.', { classId: 'This entry is withdrawn.' });
    if (entry.classId === classId) throw new ValidationError({ classId: 'The entry is already in this class.' });
    const from = await EventClass.findByPk(entry.classId, { attributes: ['id', 'name'], transaction });
    const to = await EventClass.findOne({ where: { id: classId, eventId: event.id }, attributes: ['id', 'name'], transaction });
    if (!to) throw new ValidationError({ classId: 'This show has no such class.' });
    const holdsPlace = ENTRY_PLACE_STATUSES.includes(entry.status);
    if (holdsPlace && !(await hasRoom(event, to.id, now, transaction))) throw new ConflictError(`${to.name} is full.`, { classId: `${to.name} has no free place.` });
    await entry.update({ classId: to.id }, { transaction });
    await writeAudit({ eventId: event.id, entryId, actorId: person.id, action: 'class_changed', before: { classId: from?.id, className: from?.name }, after: { classId: to.id, className: to.name } }, transaction);
    if (holdsPlace) await offerFreedPlaces(event.id, transaction, now);
    return entry;
  });
}

/** Payment taken by hand (cash, a bank transfer): the reference says so and the note is kept in the audit line. */
export async function recordManualPayment(entry: Entry, event: Event, note: string, person: Person, transaction: Transaction, now = new Date()) {
  if (entry.paidAt) throw new ConflictError('This entry is already paid.', { note: 'Already paid.' });
  if (event.entryFee === 0 || entry.feeAmount === 0) throw new ConflictError('This show is free; there is nothing to pay.');
  if (entry.status !== 'awaiting_payment') throw new ConflictError(entry.status === 'waiting_list' ? 'Move the entry up from the waiting list first.' : 'This entry is withdrawn; it cannot be paid.');
  const before = { status: entry.status, paymentRef: entry.paymentRef, paidAmount: entry.paidAmount };
  await entry.update({ status: 'confirmed', paymentRef: `manual:${randomUUID()}`, paidAt: now, paidAmount: entry.feeAmount }, { transaction });
  await writeAudit({ eventId: event.id, entryId: entry.id, actorId: person.id, action: 'marked_paid', before, after: { status: 'confirmed', paymentRef: entry.paymentRef, paidAmount: entry.paidAmount, note } }, transaction);
  await mailPaymentConfirmed(entry, event, transaction);
  // The online checkout, if one is open, must not take the fee a second time: closed once this commits,
  // without holding up the answer (the gate works on when the payment service does not).
  if (entry.checkoutId) transaction.afterCommit(() => void expireCheckoutPaidElsewhere(entry));
}

export async function markEntryPaid(entryId: number, note: string, person: Person, now = new Date(), outer?: Transaction): Promise<Entry> {
  return withTransaction(outer, async (transaction) => {
    const { event, entry } = await lockEntry(entryId, transaction);
    await recordManualPayment(entry, event, note, person, transaction, now);
    return entry;
  });
}

/**
 * The organiser gives a waiting entry a place now, out of turn or above capacity (their call):
 * it gets the next number and awaits payment, or is confirmed in a free show.
 */
export async function moveUpFromWaitingList(entryId: number, person: Person, outer?: Transaction): Promise<Entry> {
  return withTransaction(outer, async (transaction) => {
    const { event, entry } = await lockEntry(entryId, transaction);
    if (entry.status !== 'waiting_list') throw new ConflictError('This entry is not on the waiting list.');
    const number = event.lastEntryNumber + 1;
    await event.update({ lastEntryNumber: number }, { transaction });
    const before = { status: entry.status, number: entry.number };
    await entry.update({ status: event.entryFee > 0 ? 'awaiting_payment' : 'confirmed', number, waitlistedAt: null, offerExpiresAt: null }, { transaction });
    await writeAudit({ eventId: event.id, entryId, actorId: person.id, action: 'moved_up', before, after: { status: entry.status, number } }, transaction);
    await mailEntryReceived(entry, event, transaction);
    return entry;
  });
}
