import { Op, type Transaction } from 'sequelize';
import type { GateProblem, GateQueuedCheckIn, GateSyncResult } from '@shared/schemas/show-day';
import { gateProblemOf } from '@shared/gate';
import { withTransaction } from '../../db/transaction';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { GateCheckIn } from '../../models/gate-check-in';
import { writeAudit } from '../audit/audit';
import { recordManualPayment } from '../entries/entry-actions';

type Person = { id: number };

/** Every numbered entry of a show with what the gate needs to find and check it in, for the phone's copy. */
export function gateRoster(eventId: number): Promise<Entry[]> {
  return Entry.findAll({
    where: { eventId, number: { [Op.ne]: null } },
    attributes: ['id', 'number', 'classId', 'status', 'feeAmount', 'currency', 'paidAt', 'refundDue', 'refundedAt', 'checkedInAt'],
    include: [
      { model: Build, as: 'build', attributes: ['code', 'title'] },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
    order: [['number', 'ASC']],
  });
}

/** What became of one queued check-in, without words (the presenter picks them): the problem that refused it, and whether the phone took cash. */
export type AppliedCheckIn = Omit<GateSyncResult, 'message'> & { problem: GateProblem | null; phoneTookCash: boolean };
type Applied = AppliedCheckIn;

/**
 * One check-in a phone queued with no signal, applied once: the show's row is locked, so two sends of the
 * same check-in (a retry, a second tab) are taken in turn and the second finds the first's record and is
 * answered from it. A car another gate checked in first is not checked in again (its time stays the first
 * gate's) and cash is never recorded twice; the phone is told both times.
 */
async function applyOne(event: Event, deviceId: string, item: GateQueuedCheckIn, person: Person, now: Date, transaction: Transaction): Promise<Applied> {
  await Event.findByPk(event.id, { lock: transaction.LOCK.UPDATE, transaction });
  const base = { clientId: item.clientId, number: item.number, at: item.at, phoneTookCash: item.takeCash };
  const kept = await GateCheckIn.findByPk(item.clientId, { transaction });
  if (kept) {
    const entry = await Entry.findByPk(kept.entryId, { attributes: ['checkedInAt'], transaction });
    return { ...base, outcome: kept.outcome, checkedInAt: entry?.checkedInAt?.toISOString() ?? null, cashTaken: kept.cashTaken, problem: null };
  }
  const entry = await Entry.findOne({ where: { eventId: event.id, number: item.number }, lock: transaction.LOCK.UPDATE, transaction });
  if (!entry) return { ...base, outcome: 'refused', checkedInAt: null, cashTaken: false, problem: null };
  const problem = gateProblemOf(entry);
  const keep = (outcome: GateCheckIn['outcome'], cashTaken: boolean) =>
    GateCheckIn.create({ clientId: item.clientId, eventId: event.id, entryId: entry.id, deviceId, sequence: item.sequence, deviceTime: new Date(item.at), actorId: person.id, outcome, cashTaken }, { transaction });
  if (problem === 'already_checked_in') {
    await keep('already_checked_in', false);
    return { ...base, outcome: 'already_checked_in', checkedInAt: entry.checkedInAt?.toISOString() ?? null, cashTaken: false, problem };
  }
  const cash = problem === 'unpaid' && item.takeCash;
  if (problem && !cash) return { ...base, outcome: 'refused', checkedInAt: null, cashTaken: false, problem };
  if (cash) await recordManualPayment(entry, event, 'Cash taken at the gate with no signal.', person, transaction, now);
  // The car arrived when the phone says, never later than now (a phone's clock may run fast).
  const arrivedAt = new Date(Math.min(new Date(item.at).getTime(), now.getTime()));
  const before = { status: entry.status };
  await entry.update({ status: 'checked_in', checkedInAt: arrivedAt }, { transaction });
  await writeAudit({ eventId: event.id, entryId: entry.id, actorId: person.id, action: 'checked_in', before, after: { status: 'checked_in', cashTaken: cash, queuedOffline: true } }, transaction);
  await keep('checked_in', cash);
  return { ...base, outcome: 'checked_in', checkedInAt: arrivedAt.toISOString(), cashTaken: cash, problem: null };
}

/** A phone's queued check-ins, in its own order; each is applied once, and each answered. */
export async function applyQueuedCheckIns(event: Event, deviceId: string, items: GateQueuedCheckIn[], person: Person, now = new Date()): Promise<Applied[]> {
  const ordered = [...items].sort((a, b) => a.sequence - b.sequence);
  const out: Applied[] = [];
  for (const item of ordered) out.push(await withTransaction(undefined, (t) => applyOne(event, deviceId, item, person, now, t)));
  return out;
}

