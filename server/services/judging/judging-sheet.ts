import type { Transaction } from 'sequelize';
import { sheetEditable } from '@shared/event-lifecycle';
import type { JudgingSheetInput } from '@shared/schemas/show-classes';
import { Criterion } from '../../models/criterion';
import { Event } from '../../models/event';
import { ConflictError, NotFoundError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { withTransaction } from '../../db/transaction';

/** Replaces the whole sheet, in the order given, until judging starts; then it is fixed. */
export async function saveJudgingSheet(eventId: number, person: { id: number }, input: JudgingSheetInput, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    if (!sheetEditable(event.status)) throw new ConflictError('Judging has started: the judging sheet is fixed.', { criteria: 'Fixed once judging starts.' });
    const old = await Criterion.findAll({ where: { eventId }, order: [['position', 'ASC']], transaction });
    await Criterion.destroy({ where: { eventId }, transaction });
    const rows = await Criterion.bulkCreate(
      input.criteria.map((c, position) => ({ eventId, name: c.name, maxPoints: c.maxPoints, weight: c.weight, tieBreakOrder: c.tieBreakOrder, position })),
      { transaction, returning: true },
    );
    const line = (c: { name: string; maxPoints: number; weight: number; tieBreakOrder: number | null }) => ({ name: c.name, maxPoints: c.maxPoints, weight: Number(c.weight), tieBreakOrder: c.tieBreakOrder });
    await writeAudit({ eventId, actorId: person.id, action: 'judging_sheet_saved', before: old.map(line), after: input.criteria.map(line) }, transaction);
    return rows;
  });
}
