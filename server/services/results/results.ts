import { Op, type Transaction } from 'sequelize';
import { computeResults, type ResultInput, type ResultSheet, type ShowResults } from '@shared/calc/results';
import { DEFAULT_RESULT_RULES, ShowResultRulesSchema, type ShowResultRules } from '@shared/schemas/judging';
import { entryCredit, type OwnerCredit } from '@shared/schemas/owner-credit';
import { Build } from '../../models/build';
import { User } from '../../models/user';
import { Criterion } from '../../models/criterion';
import { Event } from '../../models/event';
import { ManualTieBreak } from '../../models/manual-tie-break';
import { Score } from '../../models/score';
import { NotFoundError } from '../../errors';
import { judgedEntries } from '../judging/judging';

/** The show's result rules with defaults for settings added since it was made. */
export const rulesOf = (event: Pick<Event, 'resultRules'>): ShowResultRules => ShowResultRulesSchema.parse({ ...DEFAULT_RESULT_RULES, ...event.resultRules });

/** Every finished sheet of the show: a judge's sheet for a car counts once each line has points; partly filled ones are drafts. */
export async function finishedSheets(eventId: number, entryIds: number[], criterionIds: number[], transaction?: Transaction): Promise<ResultSheet[]> {
  const scores = entryIds.length ? await Score.findAll({ where: { eventId, entryId: { [Op.in]: entryIds } }, transaction }) : [];
  const bySheet = new Map<string, ResultSheet & { points: Record<number, number> }>();
  for (const s of scores) {
    const key = `${s.entryId}:${s.judgeId}`;
    const sheet = bySheet.get(key) ?? { entryId: s.entryId, judgeId: s.judgeId, points: {} };
    sheet.points[s.criterionId] = s.points;
    bySheet.set(key, sheet);
  }
  return [...bySheet.values()].filter((s) => criterionIds.every((id) => s.points[id] !== undefined));
}

/** The results module's input from the database: the sheet, the judged cars, every finished sheet and the organiser's hand tie-breaks. */
export async function loadResultInput(eventId: number, transaction?: Transaction) {
  const event = await Event.findByPk(eventId, { transaction });
  if (!event) throw new NotFoundError('No such show.');
  const criteria = await Criterion.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']], transaction });
  const entries = await judgedEntries(eventId, transaction);
  const sheets = await finishedSheets(eventId, entries.map((e) => e.id), criteria.map((c) => c.id), transaction);
  const manual = await ManualTieBreak.findAll({ where: { eventId }, order: [['id', 'ASC']], transaction });
  const rules = rulesOf(event);
  const input: ResultInput = {
    criteria: criteria.map((c) => ({ id: c.id, maxPoints: c.maxPoints, weight: Number(c.weight), tieBreakOrder: c.tieBreakOrder })),
    entries: entries.map((e) => ({ id: e.id, classId: e.classId, number: e.number as number })),
    sheets,
    rules: {
      trimFromSheets: rules.trimFromSheets,
      placesPerClass: rules.placesPerClass,
      bestOfShow: rules.bestOfShow,
      bestOfShowKeepsClassPlace: rules.bestOfShowKeepsClassPlace,
      manualTieBreaks: manual.map((m) => ({ entryIds: m.entryIds, reason: m.reason })),
    },
  };
  return { event, rules, criteria, entries, input };
}

export type ResultCar = { entryId: number; number: number; title: string; code: string; classId: number; className: string; ownerId: number; owner: OwnerCredit };

/** The show's results as they stand, with each car's title, card code and class name. */
export async function computeShowResults(eventId: number, transaction?: Transaction) {
  const loaded = await loadResultInput(eventId, transaction);
  const results: ShowResults = loaded.input.criteria.length ? computeResults(loaded.input) : { classes: [], bestOfShow: [], ties: [] };
  const builds = loaded.entries.length ? await Build.findAll({ where: { id: { [Op.in]: loaded.entries.map((e) => e.buildId) } }, attributes: ['id', 'title', 'code'], transaction }) : [];
  const buildById = new Map(builds.map((b) => [b.id, b]));
  // Only the owner's public words are read: display name, and hometown and club where given (a walk-up: the name taken at the gate).
  const owners = loaded.entries.length ? await User.findAll({ where: { id: { [Op.in]: [...new Set(loaded.entries.map((e) => e.ownerId))] } }, attributes: ['id', 'name', 'hometown', 'club'], transaction }) : [];
  const ownerById = new Map(owners.map((u): [number, OwnerCredit] => [u.id, { name: u.name, hometown: u.hometown ?? null, club: u.club ?? null }]));
  const cars = new Map<number, ResultCar>(
    loaded.entries.map((e) => {
      const b = buildById.get(e.buildId);
      return [e.id, { entryId: e.id, number: e.number as number, title: b?.title ?? '', code: b?.code ?? '', classId: e.classId, className: e.eventClass?.name ?? '', ownerId: e.ownerId, owner: entryCredit(e.walkUpName, ownerById.get(e.ownerId) ?? { name: '', hometown: null, club: null }) }];
    }),
  );
  return { ...loaded, results, cars };
}
