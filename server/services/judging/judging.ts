import { Op, type Transaction } from 'sequelize';
import { EXPECTED_ENTRY_STATUSES, JUDGED_ENTRY_STATUSES, sheetState, type SheetState } from '@shared/schemas/judging';
import { Criterion } from '../../models/criterion';
import { Entry } from '../../models/entry';
import { EventClass } from '../../models/event-class';
import { Score } from '../../models/score';
import { SheetNote } from '../../models/sheet-note';
import { findEvent } from '../shows/events';
import { loadFullBuild } from '../builds/builds';
import { classesOfJudge, judgesClass, listJudges } from './judge-assignments';
import { EventMembership } from '../../models/event-membership';
import { Event } from '../../models/event';
import { Build } from '../../models/build';

const entriesWithStatus = (eventId: number, statuses: readonly string[], transaction?: Transaction) =>
  Entry.findAll({
    transaction,
    where: { eventId, status: { [Op.in]: [...statuses] }, number: { [Op.ne]: null } },
    include: [{ model: EventClass, as: 'eventClass', attributes: ['id', 'name', 'position'] }],
    order: [['number', 'ASC']],
  });

/** Every judged car of the show (the cars that arrived), in number order, with its class. */
export const judgedEntries = (eventId: number, transaction?: Transaction) => entriesWithStatus(eventId, JUDGED_ENTRY_STATUSES, transaction);

/** Cars holding a place that the gate has not checked in yet, in number order. */
export const expectedEntries = (eventId: number, transaction?: Transaction) => entriesWithStatus(eventId, EXPECTED_ENTRY_STATUSES, transaction);

/**
 * What one judge's phone needs: the show, its sheet, the judge's cars that arrived (only their classes)
 * with each build's public face, the ones still expected at the gate, and this judge's own scores and
 * comments: never another judge's. A late arrival joins the list on the phone's next read.
 */
export async function loadJudgeView(eventId: number, judgeId: number) {
  const event = await findEvent(eventId);
  const criteria = await Criterion.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const classes = await classesOfJudge(eventId, judgeId);
  const entries = (await judgedEntries(eventId)).filter((e) => judgesClass(classes, e.classId));
  const builds = await Promise.all(entries.map((e) => loadFullBuild({ id: e.buildId })));
  const stillExpected = (await expectedEntries(eventId)).filter((e) => judgesClass(classes, e.classId));
  const expectedBuilds = stillExpected.length ? await Build.findAll({ where: { id: { [Op.in]: stillExpected.map((e) => e.buildId) } }, attributes: ['id', 'title'] }) : [];
  const titleOf = new Map(expectedBuilds.map((b) => [b.id, b.title]));
  const ids = entries.map((e) => e.id);
  const scores = ids.length ? await Score.findAll({ where: { eventId, judgeId, entryId: { [Op.in]: ids } } }) : [];
  const notes = ids.length ? await SheetNote.findAll({ where: { eventId, judgeId, entryId: { [Op.in]: ids } } }) : [];
  return { event, criteria, assignedClasses: classes, cars: entries.map((entry, i) => ({ entry, build: builds[i]! })), expected: stillExpected.map((entry) => ({ entry, title: titleOf.get(entry.buildId) ?? '' })), scores, notes };
}

/** The shows this person judges that are being judged now, for their start screen. */
export async function listJudgingShows(judgeId: number) {
  const memberships = await EventMembership.findAll({ where: { userId: judgeId, role: 'judge' } });
  if (!memberships.length) return [];
  return Event.findAll({ where: { id: { [Op.in]: memberships.map((m) => m.eventId) }, status: 'judging' }, order: [['startsAt', 'ASC']] });
}

/** Progress for the organiser: per class how many cars have how many finished sheets; per judge what is left. */
type ClassProgress = { classId: number; name: string; cars: number; bySheets: Array<{ sheets: number; cars: number }> };
type JudgeProgress = { judgeId: number; name: string; allClasses: boolean; classIds: number[]; cars: number; scored: number; partly: number; notYet: number; leftNumbers: number[] };

export async function loadProgress(eventId: number): Promise<{ event: Event; lines: number; byClass: ClassProgress[]; byJudge: JudgeProgress[] }> {
  const event = await findEvent(eventId);
  const lines = await Criterion.count({ where: { eventId } });
  const classes = await EventClass.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const entries = await judgedEntries(eventId);
  const judges = await listJudges(eventId);
  const counts = (await Score.findAll({ where: { eventId }, attributes: ['entryId', 'judgeId'] })).reduce((m, s) => {
    const key = `${s.entryId}:${s.judgeId}`;
    m.set(key, (m.get(key) ?? 0) + 1);
    return m;
  }, new Map<string, number>());
  const stateOf = (entryId: number, judgeId: number): SheetState => sheetState(counts.get(`${entryId}:${judgeId}`) ?? 0, lines);

  const finishedSheets = (entryId: number) => judges.filter((j) => stateOf(entryId, j.id) === 'scored').length;
  const byClass = classes.map((c) => {
    const cars = entries.filter((e) => e.classId === c.id);
    const histogram = new Map<number, number>();
    for (const car of cars) histogram.set(finishedSheets(car.id), (histogram.get(finishedSheets(car.id)) ?? 0) + 1);
    return {
      classId: c.id,
      name: c.name,
      cars: cars.length,
      bySheets: [...histogram.entries()].sort((a, b) => a[0] - b[0]).map(([sheets, n]) => ({ sheets, cars: n })),
    };
  });
  const byJudge = judges.map((j) => {
    const mine = entries.filter((e) => j.allClasses || j.classIds.includes(e.classId));
    const states = mine.map((e) => stateOf(e.id, j.id));
    const left = mine.filter((_, i) => states[i] !== 'scored').map((e) => e.number as number);
    return { judgeId: j.id, name: j.name, allClasses: j.allClasses, classIds: j.classIds, cars: mine.length, scored: states.filter((s) => s === 'scored').length, partly: states.filter((s) => s === 'partly').length, notYet: states.filter((s) => s === 'not_yet').length, leftNumbers: left };
  });
  return { event, lines, byClass, byJudge };
}
