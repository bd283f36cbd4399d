import { Op, type Transaction } from 'sequelize';
import { ENTRY_PLACE_STATUSES, WAITLIST_OFFER_HOURS } from '@shared/constants';
import { withTransaction } from '../../db/transaction';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { writeAudit } from '../audit/audit';
import { mailOffer } from './entry-mail';

/** Entries holding a place: those with a place, and waiting-list entries with an offer still open. */
const holdingAPlace = (now: Date) => ({ [Op.or]: [{ status: { [Op.in]: [...ENTRY_PLACE_STATUSES] } }, { status: 'waiting_list', offerExpiresAt: { [Op.gt]: now } }] });

export function placesTaken(eventId: number, classId: number | null, now: Date, transaction: Transaction) {
  return Entry.count({ where: { eventId, ...(classId ? { classId } : {}), ...holdingAPlace(now) }, transaction });
}

/**
 * Places left in each class, as `hasRoom` counts them (open offers hold a place): the smaller of the
 * class's room and the show's; null where neither the class nor the show sets a limit.
 */
export async function placesLeftByClass(event: Pick<Event, 'id' | 'capacity'>, classes: readonly Pick<EventClass, 'id' | 'capacity'>[], now = new Date()): Promise<Map<number, number | null>> {
  const counts = (await Entry.count({ where: { eventId: event.id, ...holdingAPlace(now) }, group: ['classId'] })) as unknown as { classId: number; count: number }[];
  const takenIn = new Map(counts.map((c) => [Number(c.classId), Number(c.count)]));
  const showTaken = counts.reduce((sum, c) => sum + Number(c.count), 0);
  const showLeft = event.capacity === null ? null : Math.max(0, event.capacity - showTaken);
  return new Map(
    classes.map((c) => {
      const classLeft = c.capacity === null ? null : Math.max(0, c.capacity - (takenIn.get(c.id) ?? 0));
      const left = classLeft === null ? showLeft : showLeft === null ? classLeft : Math.min(classLeft, showLeft);
      return [c.id, left];
    }),
  );
}

/** Is there a free place in this class of this show? (The show's row is locked by the caller.) */
export async function hasRoom(event: Event, classId: number, now: Date, transaction: Transaction): Promise<boolean> {
  if (event.capacity !== null && (await placesTaken(event.id, null, now, transaction)) >= event.capacity) return false;
  const cls = await EventClass.findByPk(classId, { attributes: ['capacity'], transaction });
  if (cls?.capacity != null && (await placesTaken(event.id, classId, now, transaction)) >= cls.capacity) return false;
  return true;
}

/**
 * Places freed (a withdrawal, a lapsed offer, a larger capacity): offer each to the first in line
 * whose class has room, by e-mail, with a deadline. Only while the show still takes or holds entries.
 */
export async function offerFreedPlaces(eventId: number, transaction: Transaction, now = new Date()): Promise<void> {
  const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
  if (!event || !['registration_open', 'registration_closed'].includes(event.status)) return;
  const waiting = await Entry.findAll({
    where: { eventId, status: 'waiting_list', [Op.or]: [{ offerExpiresAt: null }, { offerExpiresAt: { [Op.lte]: now } }] },
    order: [['waitlistedAt', 'ASC'], ['id', 'ASC']],
    transaction,
  });
  for (const entry of waiting) {
    if (!(await hasRoom(event, entry.classId, now, transaction))) {
      if (event.capacity !== null && (await placesTaken(event.id, null, now, transaction)) >= event.capacity) return;
      continue;
    }
    const offerExpiresAt = new Date(now.getTime() + WAITLIST_OFFER_HOURS * 3600_000);
    await entry.update({ offerExpiresAt }, { transaction });
    await writeAudit({ eventId, entryId: entry.id, actorId: null, action: 'place_offered', before: { offerExpiresAt: null }, after: { offerExpiresAt: offerExpiresAt.toISOString() } }, transaction);
    await mailOffer(entry, event, transaction);
  }
}

/**
 * Offers whose deadline passed: the entry leaves the waiting list and the place goes to the next
 * in line. Run before any write to a show's entries, and by the minute's scheduled sweep; reads never
 * write, so an offer past its deadline reads as lapsed (its deadline is in the answer) until then.
 */
export async function lapseExpiredOffers(eventId: number, transaction: Transaction, now = new Date()): Promise<number> {
  const lapsed = await Entry.findAll({ where: { eventId, status: 'waiting_list', offerExpiresAt: { [Op.lte]: now } }, lock: transaction.LOCK.UPDATE, transaction });
  for (const entry of lapsed) {
    await entry.update({ status: 'withdrawn', withdrawnAt: now }, { transaction });
    await writeAudit({ eventId, entryId: entry.id, actorId: null, action: 'offer_lapsed', before: { status: 'waiting_list' }, after: { status: 'withdrawn' } }, transaction);
  }
  if (lapsed.length) await offerFreedPlaces(eventId, transaction, now);
  return lapsed.length;
}

/** Lapses the expired offers of one show in a transaction of its own (a write path calls this first). */
export async function settleOffers(eventId: number, now = new Date(), outer?: Transaction): Promise<void> {
  const any = await Entry.count({ where: { eventId, status: 'waiting_list', offerExpiresAt: { [Op.lte]: now } } });
  if (!any) return;
  await withTransaction(outer, async (transaction) => {
    await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    await lapseExpiredOffers(eventId, transaction, now);
  });
}

/** The periodic sweep over every show with a lapsed offer; the job queue or a timer calls it. */
export async function sweepExpiredOffers(now = new Date()): Promise<number> {
  const rows = await Entry.findAll({ where: { status: 'waiting_list', offerExpiresAt: { [Op.lte]: now } }, attributes: ['eventId'], group: ['eventId'] });
  for (const { eventId } of rows) await settleOffers(eventId, now);
  return rows.length;
}
