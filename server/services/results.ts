import { Op } from 'sequelize';
import { computeResults, type ResultInput, type ResultSheet, type ShowResults } from '@shared/calc/results';
import { Criterion } from '../models/criterion';
import { Score } from '../models/score';
import { findEvent } from './events';
import { judgedEntries } from './judging';
import { loadFullBuild } from './builds';

/**
 * The results module's input from the database: the sheet, the judged cars and every finished
 * sheet (a judge's sheet for a car counts once each line has points; partly filled ones are drafts).
 */
export async function loadResultInput(eventId: number): Promise<{ input: ResultInput; entries: Awaited<ReturnType<typeof judgedEntries>> }> {
  const event = await findEvent(eventId);
  const criteria = await Criterion.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const entries = await judgedEntries(eventId);
  const scores = entries.length ? await Score.findAll({ where: { eventId, entryId: { [Op.in]: entries.map((e) => e.id) } } }) : [];
  const bySheet = new Map<string, ResultSheet & { points: Record<number, number> }>();
  for (const s of scores) {
    const key = `${s.entryId}:${s.judgeId}`;
    const sheet = bySheet.get(key) ?? { entryId: s.entryId, judgeId: s.judgeId, points: {} };
    sheet.points[s.criterionId] = s.points;
    bySheet.set(key, sheet);
  }
  const lineIds = criteria.map((c) => c.id);
  const sheets = [...bySheet.values()].filter((s) => lineIds.every((id) => s.points[id] !== undefined));
  const { trimFromSheets, placesPerClass, bestOfShow, bestOfShowKeepsClassPlace } = event.resultRules;
  return {
    entries,
    input: {
      criteria: criteria.map((c) => ({ id: c.id, maxPoints: c.maxPoints, weight: Number(c.weight), tieBreakOrder: c.tieBreakOrder })),
      entries: entries.map((e) => ({ id: e.id, classId: e.classId, number: e.number as number })),
      sheets,
      rules: { trimFromSheets, placesPerClass, bestOfShow, bestOfShowKeepsClassPlace },
    },
  };
}

/** The show's results as they stand (the organiser's review before publishing), with each car's title and class name. */
export async function computeShowResults(eventId: number): Promise<{ results: ShowResults; cars: Map<number, { number: number; title: string; className: string }> }> {
  const { input, entries } = await loadResultInput(eventId);
  const results = input.criteria.length ? computeResults(input) : { classes: [], bestOfShow: [], ties: [] };
  const builds = await Promise.all(entries.map((e) => loadFullBuild({ id: e.buildId })));
  const cars = new Map(entries.map((e, i) => [e.id, { number: e.number as number, title: builds[i]?.title ?? '', className: e.eventClass?.name ?? '' }]));
  return { results, cars };
}
