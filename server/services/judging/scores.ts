import { Op, QueryTypes, type Transaction } from 'sequelize';
import { DEVICE_CLOCK_AHEAD_MAX_MS, JUDGED_ENTRY_STATUSES, type ScoreSubmitInput } from '@shared/schemas/judging';
import { sequelize } from '../../db/sequelize';
import { Criterion } from '../../models/criterion';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../../errors';
import { classesOfJudge, judgesClass } from './judge-assignments';
import { writeAudit } from '../audit/audit';
import { withTransaction } from '../../db/transaction';

/** Why a score is refused when the show no longer takes them, in words the judge's phone shows as they are. */
export function judgingClosedReason(event: Pick<Event, 'status' | 'judgingClosedAt'>): string | null {
  if (event.status === 'judging' && !event.judgingClosedAt) return null;
  if (event.status === 'judging') return 'Judging is closed: the organiser has locked the scores, so this change was not recorded.';
  if (event.status === 'results_published' || event.status === 'archived') return 'Results are published: scores are locked, so this change was not recorded.';
  return 'Judging has not started for this show yet.';
}

// Newest by the judge's device time wins; the device's id breaks a tie in device time so every server picks
// the same row. A replay (same time, same id) or an older value matches no row and changes nothing.
const UPSERT_SCORE = `
  INSERT INTO scores (event_id, entry_id, judge_id, criterion_id, points, comment, device_time, client_id, created_at, updated_at)
  VALUES (:eventId, :entryId, :judgeId, :criterionId, :points, :comment, :deviceTime, :clientId, now(), now())
  ON CONFLICT (entry_id, judge_id, criterion_id) DO UPDATE
    SET points = EXCLUDED.points, comment = EXCLUDED.comment, device_time = EXCLUDED.device_time, client_id = EXCLUDED.client_id, updated_at = now()
    WHERE (scores.device_time, scores.client_id) < (EXCLUDED.device_time, EXCLUDED.client_id)
  RETURNING id`;
const UPSERT_NOTE = `
  INSERT INTO sheet_notes (event_id, entry_id, judge_id, comment, device_time, client_id, created_at, updated_at)
  VALUES (:eventId, :entryId, :judgeId, :comment, :deviceTime, :clientId, now(), now())
  ON CONFLICT (entry_id, judge_id) DO UPDATE
    SET comment = EXCLUDED.comment, device_time = EXCLUDED.device_time, client_id = EXCLUDED.client_id, updated_at = now()
    WHERE (sheet_notes.device_time, sheet_notes.client_id) < (EXCLUDED.device_time, EXCLUDED.client_id)
  RETURNING id`;

/**
 * Records a judge's scores and car comments: all of them or none. Every item is checked first
 * (its line on this show's sheet, points within 0…max, a judged car of the show in the judge's
 * classes, a device clock not far ahead); the show row is read FOR SHARE, so closing judging
 * (FOR UPDATE) waits for sends in flight and every later send sees it closed.
 */
export async function submitScores(eventId: number, judgeId: number, input: ScoreSubmitInput, now = new Date(), outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.SHARE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    const closed = judgingClosedReason(event);
    if (closed) throw new ConflictError(closed);

    const criteria = new Map((await Criterion.findAll({ where: { eventId }, transaction })).map((c) => [c.id, c]));
    const entryIds = [...new Set([...input.scores, ...input.notes].map((i) => i.entryId))];
    const entries = new Map((await Entry.findAll({ where: { id: { [Op.in]: entryIds }, eventId, status: { [Op.in]: [...JUDGED_ENTRY_STATUSES] } }, transaction })).map((e) => [e.id, e]));
    const classes = await classesOfJudge(eventId, judgeId, transaction);

    const problems: Record<string, string> = {};
    let outsideClasses = false;
    const checkCommon = (path: string, item: { entryId: number; deviceTime: string }) => {
      const entry = entries.get(item.entryId);
      if (!entry) problems[`${path}.entryId`] = 'This car is not judged in this show.';
      else if (!judgesClass(classes, entry.classId)) outsideClasses = true;
      if (new Date(item.deviceTime).getTime() - now.getTime() > DEVICE_CLOCK_AHEAD_MAX_MS) problems[`${path}.deviceTime`] = 'The phone’s clock is more than a day ahead; set its date and time, then send again.';
    };
    input.scores.forEach((s, i) => {
      checkCommon(`scores.${i}`, s);
      const criterion = criteria.get(s.criterionId);
      if (!criterion) problems[`scores.${i}.criterionId`] = 'This line is not on this show’s judging sheet.';
      else if (s.points > criterion.maxPoints) problems[`scores.${i}.points`] = `${criterion.name} scores 0 to ${criterion.maxPoints} points.`;
    });
    input.notes.forEach((n, i) => checkCommon(`notes.${i}`, n));
    if (Object.keys(problems).length) throw new ValidationError(problems, 'Some scores cannot be recorded.');
    if (outsideClasses) throw new AppError(403, 'FORBIDDEN', 'A car in this sheet is in a class you are not judging.');

    const applied: Array<{ clientId: string; applied: boolean }> = [];
    for (const s of input.scores) {
      const rows = await upsert(UPSERT_SCORE, { eventId, judgeId, entryId: s.entryId, criterionId: s.criterionId, points: s.points, comment: s.comment, deviceTime: new Date(s.deviceTime), clientId: s.clientId }, transaction);
      applied.push({ clientId: s.clientId, applied: rows > 0 });
    }
    for (const n of input.notes) {
      const rows = await upsert(UPSERT_NOTE, { eventId, judgeId, entryId: n.entryId, comment: n.comment, deviceTime: new Date(n.deviceTime), clientId: n.clientId }, transaction);
      applied.push({ clientId: n.clientId, applied: rows > 0 });
    }
    return applied;
  });
}

async function upsert(sql: string, replacements: Record<string, unknown>, transaction: Transaction): Promise<number> {
  const rows = await sequelize.query<{ id: number }>(sql, { replacements, type: QueryTypes.SELECT, transaction });
  return rows.length;
}

/** Closes judging (scores refused from now on) or opens it again before results are published; an audit line either way. */
export async function setJudgingClosed(eventId: number, closed: boolean, person: { id: number }, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    if (event.status !== 'judging') throw new ConflictError('Judging can be closed or reopened only while the show is being judged.');
    if (Boolean(event.judgingClosedAt) === closed) return;
    await event.update({ judgingClosedAt: closed ? new Date() : null }, { transaction });
    await writeAudit({ eventId, actorId: person.id, action: closed ? 'judging_closed' : 'judging_reopened' }, transaction);
  });
}
