import { Op, type Transaction } from 'sequelize';
import { totalShown, type OwnResults, type ResultsSnapshot } from '@shared/schemas/results';
import { Score } from '../../models/score';
import { SheetNote } from '../../models/sheet-note';
import { ConflictError } from '../../errors';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import type { Entry } from '../../models/entry';
import { finishedSheets } from './results';
import { loadPublishedResults } from './published-results';

/**
 * One car's published results for its owner: place, total, the mean of each criterion with every
 * finished sheet's points (no judge named), and the judges' comments only when the show shares them.
 */
export async function ownResultsOf(
  snapshot: ResultsSnapshot,
  car: { entryId: number; eventId: number; showName: string; className: string },
  transaction?: Transaction,
): Promise<OwnResults> {
  const mine = snapshot.entries.find((e) => e.entryId === car.entryId);
  const criterionIds = snapshot.criteria.map((c) => c.id);
  const sheets = (await finishedSheets(car.eventId, [car.entryId], criterionIds, transaction)).sort((a, b) => a.judgeId - b.judgeId);
  let comments: OwnResults['comments'] = null;
  if (snapshot.rules.shareCommentsWithEntrants) {
    const judges = sheets.map((s) => s.judgeId);
    const where = { eventId: car.eventId, entryId: car.entryId, judgeId: { [Op.in]: judges } };
    const lineComments = judges.length ? await Score.findAll({ where: { ...where, comment: { [Op.ne]: '' } }, order: [['criterionId', 'ASC'], ['judgeId', 'ASC']], transaction }) : [];
    const notes = judges.length ? await SheetNote.findAll({ where: { ...where, comment: { [Op.ne]: '' } }, order: [['judgeId', 'ASC']], transaction }) : [];
    const name = new Map(snapshot.criteria.map((c) => [c.id, c.name]));
    comments = [...lineComments.map((s) => ({ criterion: name.get(s.criterionId) ?? null, text: s.comment })), ...notes.map((n) => ({ criterion: null, text: n.comment }))];
  }
  return {
    entryId: car.entryId,
    number: mine?.number ?? 0,
    showName: car.showName,
    className: car.className,
    place: mine?.place ?? null,
    shared: mine?.shared ?? false,
    placesAwarded: snapshot.rules.placesPerClass,
    bestOfShow: snapshot.bestOfShow.some((b) => b.entryId === car.entryId),
    total: mine?.total === null || mine?.total === undefined ? null : totalShown(mine.total),
    sheetsCounted: mine?.sheetsCounted ?? 0,
    criteria: snapshot.criteria.map((c) => ({
      name: c.name,
      maxPoints: c.maxPoints,
      weight: c.weight,
      mean: totalShown(mine?.criterionMeans[String(c.id)] ?? 0),
      judges: sheets.map((s) => s.points[c.id] ?? 0),
    })),
    comments,
  };
}

/** A car's own results for the app: refused until the show publishes, so nothing shows early. */
export async function loadOwnResults(entry: Pick<Entry, 'id' | 'eventId' | 'classId'>): Promise<OwnResults> {
  const snapshot = await loadPublishedResults(entry.eventId);
  if (!snapshot) throw new ConflictError('Scores are shown here once the show publishes its results.');
  if (!snapshot.entries.some((e) => e.entryId === entry.id)) throw new ConflictError('This car was not judged in the show.');
  const event = await Event.findByPk(entry.eventId, { attributes: ['name'] });
  const cls = await EventClass.findByPk(entry.classId, { attributes: ['name'] });
  return ownResultsOf(snapshot, { entryId: entry.id, eventId: entry.eventId, showName: event?.name ?? '', className: cls?.name ?? '' });
}
