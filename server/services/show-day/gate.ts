import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import { CHECK_IN_UNDO_SECONDS, type GateCounts, type GateProblem } from '@shared/schemas/show-day';
import { cardOfAnotherShow, gateProblemMessage, gateProblemOf, gateScanOf } from '@shared/gate';
import { formatInZone } from '@shared/calc/time-zone';
import { sequelize } from '../../db/sequelize';
import { withTransaction } from '../../db/transaction';
import { AuditLine } from '../../models/audit-line';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { Photo } from '../../models/photo';
import { ConflictError, NotFoundError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { recordManualPayment } from '../entries/entry-actions';

type Person = { id: number };

const entryInclude = [
  { model: Build, as: 'build', attributes: ['id', 'title', 'code'], include: [{ model: Photo, as: 'photos', attributes: ['storageKey', 'variants', 'isCover', 'position'] }] },
  { model: EventClass, as: 'eventClass', attributes: ['id', 'name'] },
];

const timeAt = (d: Date, event: Event) => formatInZone(d.toISOString(), event.timeZone, { hour: '2-digit', minute: '2-digit' });

/** What the gate found: an entry of this show (with its car and class), or nothing and why (another show's card: its name, and the car's number here if it has one). */
export type GateFinding = { entry: Entry; problem: GateProblem | null } | { entry: null; problem: GateProblem; otherShowName?: string; numberHere?: number | null };

const found = (entry: Entry): GateFinding => ({ entry, problem: gateProblemOf(entry) });

/**
 * A scanned card or a typed number, looked up in this show only. A numbered card of another show is
 * refused by that show's name even when the car is entered here too (its card here has its own number);
 * a build not entered here offers nothing but the message.
 */
export async function gateLookup(event: Event, what: { code?: string; number?: number }): Promise<GateFinding> {
  if (what.number !== undefined) {
    const entry = await Entry.findOne({ where: { eventId: event.id, number: what.number }, include: entryInclude });
    if (!entry) throw new NotFoundError(`No entry number ${what.number} in this show.`);
    return found(entry);
  }
  const scan = gateScanOf(what.code ?? '');
  const build = scan ? await Build.findOne({ where: { code: scan.code }, attributes: ['id'] }) : null;
  if (!scan || !build) return { entry: null, problem: 'unknown_code' };
  const entry = await Entry.findOne({ where: { eventId: event.id, buildId: build.id }, include: entryInclude });
  const cardShow = scan.showSlug !== null && scan.showSlug !== event.slug ? await Event.findOne({ where: { slug: scan.showSlug }, attributes: ['name'] }) : null;
  const numberHere = entry && entry.status !== 'withdrawn' ? entry.number : null;
  if (cardOfAnotherShow(scan, event, numberHere, cardShow !== null)) return { entry: null, problem: 'other_show', otherShowName: cardShow?.name ?? '', numberHere };
  if (entry) return found(entry);
  const elsewhere = await Entry.findOne({
    where: { buildId: build.id, status: { [Op.ne]: 'withdrawn' } },
    include: [{ model: Event, as: 'event', attributes: ['name', 'startsAt'] }],
    order: [[{ model: Event, as: 'event' }, 'startsAt', 'DESC']],
  });
  return elsewhere ? { entry: null, problem: 'other_show', otherShowName: elsewhere.event?.name ?? '' } : { entry: null, problem: 'not_entered' };
}

async function reload(entryId: number): Promise<GateFinding> {
  return found((await Entry.findByPk(entryId, { include: entryInclude }))!);
}

/**
 * Check a car in by its number. A confirmed entry checks in; an unpaid one only with `takeCash`
 * (the fee is recorded as paid by hand in the same transaction); anything else is refused with the
 * reason, and a second check-in changes nothing.
 */
export async function gateCheckIn(event: Event, number: number, takeCash: boolean, person: Person, now = new Date(), outer?: Transaction): Promise<GateFinding> {
  const entryId = await withTransaction(outer, async (transaction) => {
    const locked = await Event.findByPk(event.id, { lock: transaction.LOCK.UPDATE, transaction });
    const entry = await Entry.findOne({ where: { eventId: event.id, number }, lock: transaction.LOCK.UPDATE, transaction });
    if (!locked || !entry) throw new NotFoundError(`No entry number ${number} in this show.`);
    const problem = gateProblemOf(entry);
    if (problem === 'unpaid' && takeCash) {
      await recordManualPayment(entry, locked, 'Cash taken at the gate.', person, transaction, now);
    } else if (problem) {
      throw new ConflictError(gateProblemMessage(problem, { number, at: entry.checkedInAt ? timeAt(entry.checkedInAt, event) : undefined }), { number: problem });
    }
    const before = { status: entry.status };
    await entry.update({ status: 'checked_in', checkedInAt: now }, { transaction });
    await writeAudit({ eventId: event.id, entryId: entry.id, actorId: person.id, action: 'checked_in', before, after: { status: 'checked_in', cashTaken: problem === 'unpaid' } }, transaction);
    return entry.id;
  });
  return reload(entryId);
}

/**
 * Undo a check-in made less than a minute ago (a wrong car, a slip of the thumb). Cash taken with
 * it is undone too, so the entry is exactly as it was.
 */
export async function undoCheckIn(event: Event, entryId: number, person: Person, now = new Date(), outer?: Transaction): Promise<GateFinding> {
  await withTransaction(outer, async (transaction) => {
    await Event.findByPk(event.id, { lock: transaction.LOCK.UPDATE, transaction });
    const entry = await Entry.findOne({ where: { id: entryId, eventId: event.id }, lock: transaction.LOCK.UPDATE, transaction });
    if (!entry) throw new NotFoundError('No such entry in this show.');
    if (entry.status !== 'checked_in' || !entry.checkedInAt) throw new ConflictError('This entry is not checked in.', { entryId: 'Not checked in.' });
    if (now.getTime() - entry.checkedInAt.getTime() > CHECK_IN_UNDO_SECONDS * 1000) throw new ConflictError(`A check-in can be undone for ${CHECK_IN_UNDO_SECONDS} seconds only; ask an organiser.`, { entryId: 'Too late to undo.' });
    const line = await AuditLine.findOne({ where: { entryId, action: 'checked_in' }, order: [['id', 'DESC']], transaction });
    const cashTaken = Boolean((line?.after as { cashTaken?: boolean } | null)?.cashTaken);
    const before = { status: entry.status, paymentRef: entry.paymentRef };
    await entry.update({ status: cashTaken ? 'awaiting_payment' : 'confirmed', checkedInAt: null, ...(cashTaken ? { paidAt: null, paidAmount: null, paymentRef: null } : {}) }, { transaction });
    await writeAudit({ eventId: event.id, entryId, actorId: person.id, action: 'check_in_undone', before, after: { status: entry.status, cashReturned: cashTaken } }, transaction);
  });
  return reload(entryId);
}

/** Arrived / expected per class: expected counts every entry with a place (paid or not), arrived those checked in. */
export async function gateCounts(eventId: number): Promise<GateCounts> {
  const classes = await EventClass.findAll({ where: { eventId }, attributes: ['id', 'name'], order: [['position', 'ASC'], ['id', 'ASC']] });
  const rows = (await Entry.findAll({
    where: { eventId, status: { [Op.in]: ['awaiting_payment', 'confirmed', 'checked_in'] } },
    attributes: ['classId', 'status', [sequelize.fn('COUNT', sequelize.col('id')), 'n']],
    group: ['classId', 'status'],
    raw: true,
  })) as unknown as Array<{ classId: number; status: string; n: string }>;
  const out = classes.map((c) => {
    const mine = rows.filter((r) => r.classId === c.id);
    const sum = (pred: (r: { status: string }) => boolean) => mine.filter(pred).reduce((s, r) => s + Number(r.n), 0);
    return { classId: c.id, name: c.name, arrived: sum((r) => r.status === 'checked_in'), expected: sum(() => true) };
  });
  return { classes: out, arrived: out.reduce((s, c) => s + c.arrived, 0), expected: out.reduce((s, c) => s + c.expected, 0) };
}
