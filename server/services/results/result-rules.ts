import type { Transaction } from 'sequelize';
import type { ResultRulesUpdateInput } from '@shared/schemas/results';
import { Event } from '../../models/event';
import { ConflictError, NotFoundError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { rulesOf } from './results';
import { withTransaction } from '../../db/transaction';

/** The organiser's result rules; fixed once results are published, since the published places were made with them. */
export async function updateResultRules(eventId: number, person: { id: number }, input: ResultRulesUpdateInput, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    if (event.status === 'results_published' || event.status === 'archived') throw new ConflictError('Results are published: the rules they were made with cannot change.');
    const before = rulesOf(event);
    await event.update({ resultRules: input }, { transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'result_rules_changed', before, after: input }, transaction);
    return rulesOf(event);
  });
}
