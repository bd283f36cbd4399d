import { spreadsheetCsv } from '../../spreadsheet-csv';
import { Build } from '../../models/build';
import { Criterion } from '../../models/criterion';
import { Entry } from '../../models/entry';
import { EventClass } from '../../models/event-class';
import { Score } from '../../models/score';
import { User } from '../../models/user';

/**
 * Every score of the show, one row per judge × car × criterion, for the organisers' spreadsheet.
 * Written as `entry-export.ts` writes entries: a byte-order mark, a header row, points and weights
 * as bare numbers, and `escape_formulas` against spreadsheet formula injection (OWASP "CSV Injection").
 */
export async function scoresCsv(eventId: number): Promise<string> {
  const criteria = await Criterion.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const scores = await Score.findAll({ where: { eventId } });
  const entries = await Entry.findAll({
    where: { eventId },
    attributes: ['id', 'number', 'classId', 'buildId'],
    include: [
      { model: Build, as: 'build', attributes: ['title'] },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
  });
  const judges = scores.length ? await User.findAll({ where: { id: [...new Set(scores.map((s) => s.judgeId))] }, attributes: ['id', 'name'] }) : [];
  const entryById = new Map(entries.map((e) => [e.id, e]));
  const judgeName = new Map(judges.map((j) => [j.id, j.name]));
  const position = new Map(criteria.map((c, i) => [c.id, i]));
  const lines = new Map<string, number>();
  for (const s of scores) lines.set(`${s.entryId}:${s.judgeId}`, (lines.get(`${s.entryId}:${s.judgeId}`) ?? 0) + 1);
  const rows = scores
    .map((s) => ({ s, e: entryById.get(s.entryId), c: criteria[position.get(s.criterionId) ?? -1] }))
    .filter((r) => r.e && r.c)
    .sort((a, b) => (a.e!.number ?? 0) - (b.e!.number ?? 0) || (judgeName.get(a.s.judgeId) ?? '').localeCompare(judgeName.get(b.s.judgeId) ?? '') || a.s.judgeId - b.s.judgeId || position.get(a.s.criterionId)! - position.get(b.s.criterionId)!)
    .map(({ s, e, c }) => ({
      number: e!.number,
      title: e!.build?.title ?? '',
      class: e!.eventClass?.name ?? '',
      judge: judgeName.get(s.judgeId) ?? '',
      criterion: c!.name,
      points: s.points,
      maxPoints: c!.maxPoints,
      weight: Number(c!.weight),
      finished: (lines.get(`${s.entryId}:${s.judgeId}`) ?? 0) >= criteria.length ? 'yes' : 'no',
      comment: s.comment,
      deviceTime: s.deviceTime.toISOString(),
    }));
  return spreadsheetCsv(rows, {
    number: 'Number',
    title: 'Car',
    class: 'Class',
    judge: 'Judge',
    criterion: 'Criterion',
    points: 'Points',
    maxPoints: 'Max points',
    weight: 'Weight',
    finished: 'Sheet finished',
    comment: 'Comment',
    deviceTime: 'Scored at (UTC, judge’s device)',
  });
}
