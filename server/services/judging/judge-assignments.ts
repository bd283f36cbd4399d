import { Op, type Transaction } from 'sequelize';
import type { JudgeClassesInput } from '@shared/schemas/judging';
import { EventClass } from '../../models/event-class';
import { EventMembership } from '../../models/event-membership';
import { JudgeAssignment } from '../../models/judge-assignment';
import { User } from '../../models/user';
import { ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { withTransaction } from '../../db/transaction';

/** A judge's classes: 'all', or the ids of the classes they score (empty = none assigned yet). */
export type JudgeClasses = 'all' | ReadonlySet<number>;

export async function classesOfJudge(eventId: number, judgeId: number, transaction?: Transaction): Promise<JudgeClasses> {
  const rows = await JudgeAssignment.findAll({ where: { eventId, judgeId }, transaction });
  if (rows.some((r) => r.classId === null)) return 'all';
  return new Set(rows.map((r) => r.classId as number));
}

export const judgesClass = (classes: JudgeClasses, classId: number) => classes === 'all' || classes.has(classId);

/** Replaces a judge's classes in one transaction, with an audit line. The person must hold the judge role in this show. */
export async function assignJudge(eventId: number, judgeId: number, input: JudgeClassesInput, person: { id: number }, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const membership = await EventMembership.findOne({ where: { eventId, userId: judgeId, role: 'judge' }, transaction });
    if (!membership) throw new ValidationError({ judgeId: 'This person is not a judge of this show; invite them as a judge first.' });
    const classIds = [...new Set(input.classIds)];
    if (!input.allClasses) {
      const found = await EventClass.count({ where: { eventId, id: { [Op.in]: classIds } }, transaction });
      if (found !== classIds.length) throw new ValidationError({ classIds: 'A class is not one of this show’s classes.' });
    }
    const before = await classesOfJudge(eventId, judgeId, transaction);
    await JudgeAssignment.destroy({ where: { eventId, judgeId }, transaction });
    const rows = input.allClasses ? [{ eventId, judgeId, classId: null }] : classIds.map((classId) => ({ eventId, judgeId, classId }));
    await JudgeAssignment.bulkCreate(rows, { transaction });
    const describe = (c: JudgeClasses | 'all') => (c === 'all' ? 'all' : [...c].sort((a, b) => a - b));
    await writeAudit({ eventId, actorId: person.id, action: 'judge_assigned', before: { judgeId, classes: describe(before) }, after: { judgeId, classes: input.allClasses ? 'all' : classIds.sort((a, b) => a - b) } }, transaction);
  });
}

/** The show's judges with their classes, by name. */
export async function listJudges(eventId: number) {
  const members = await EventMembership.findAll({ where: { eventId, role: 'judge' }, include: [{ model: User, as: 'user', attributes: ['id', 'name'] }] });
  const assignments = await JudgeAssignment.findAll({ where: { eventId } });
  return members
    .map((m) => {
      const mine = assignments.filter((a) => a.judgeId === m.userId);
      const all = mine.some((a) => a.classId === null);
      return { id: m.userId, name: m.user?.name ?? '', allClasses: all, classIds: all ? [] : mine.map((a) => a.classId as number).sort((a, b) => a - b) };
    })
    .sort((a, b) => a.name.localeCompare(b.name) || a.id - b.id);
}
