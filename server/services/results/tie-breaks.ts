import type { Transaction } from 'sequelize';
import type { TieBreakCreateInput } from '@shared/schemas/results';
import { Event } from '../../models/event';
import { ManualTieBreak } from '../../models/manual-tie-break';
import { User } from '../../models/user';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { computeShowResults } from './results';
import { withTransaction } from '../../db/transaction';
import { oneOfShow } from '../../db/one-of-show';

type Person = { id: number };

/** Results can be changed by hand until they are published. */
async function lockUnpublished(eventId: number, transaction: import('sequelize').Transaction) {
  const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
  if (!event) throw new NotFoundError('No such show.');
  if (event.status === 'results_published' || event.status === 'archived') throw new ConflictError('Results are published: the order of places can no longer change.');
  if (event.status !== 'judging') throw new ConflictError('Ties are ordered by hand once judging has started.');
  return event;
}

/**
 * The organiser orders cars the rules left tied, best first, with a reason. The cars must be exactly
 * one tie the results flag now, so a hand order never overrides a place the scores decided.
 */
export async function addTieBreak(eventId: number, person: Person, input: TieBreakCreateInput, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    await lockUnpublished(eventId, transaction);
    const { results, cars } = await computeShowResults(eventId, transaction);
    const wanted = [...input.entryIds].sort((a, b) => a - b);
    const tie = results.ties.find((t) => t.entryIds.length === wanted.length && [...t.entryIds].sort((a, b) => a - b).every((id, i) => id === wanted[i]));
    if (!tie) throw new ValidationError({ entryIds: 'These cars are not one of the ties the results show: list every car of one tie.' });
    const row = await ManualTieBreak.create({ eventId, entryIds: input.entryIds, reason: input.reason, createdBy: person.id }, { transaction });
    const numbers = input.entryIds.map((id) => cars.get(id)?.number ?? null);
    await writeAudit({ eventId, actorId: person.id, action: 'tie_ordered_by_hand', before: { scope: tie.scope, place: tie.place, shared: [...numbers].sort() }, after: { order: numbers, reason: input.reason } }, transaction);
    return row;
  });
}

export async function removeTieBreak(eventId: number, tieBreakId: number, person: Person, outer?: Transaction) {
  await withTransaction(outer, async (transaction) => {
    await lockUnpublished(eventId, transaction);
    const row = await oneOfShow(ManualTieBreak, tieBreakId, eventId, 'tie-break', transaction);
    await row.destroy({ transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'tie_order_removed', before: { entryIds: row.entryIds, reason: row.reason } }, transaction);
  });
}

/** The hand orders of the show with who made them. */
export async function listTieBreaks(eventId: number) {
  const rows = await ManualTieBreak.findAll({ where: { eventId }, order: [['id', 'ASC']] });
  const people = rows.length ? await User.findAll({ where: { id: rows.map((r) => r.createdBy).filter((id): id is number => id !== null) }, attributes: ['id', 'name'] }) : [];
  const names = new Map(people.map((p) => [p.id, p.name]));
  return rows.map((r) => ({ row: r, by: r.createdBy ? (names.get(r.createdBy) ?? '') : '' }));
}
