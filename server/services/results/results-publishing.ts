import type { Transaction } from 'sequelize';
import type { RankedEntry } from '@shared/calc/results';
import { ConflictError } from '../../errors';
import { publishWarnings } from './publish-warnings';
import { decidedByWords, publishWarningWords, UNACKNOWLEDGED_WARNINGS_MESSAGE, ResultsSnapshotSchema, type ResultsSnapshot, type SnapshotLine } from '@shared/schemas/results';
import { PublishedResults } from '../../models/published-results';
import { computeShowResults, type ResultCar } from './results';
import { mailResultsToEntrants } from './results-mail';
import { peoplesChoiceResult } from './peoples-choice';

/** The results as they will be published: places, totals and each car's per-criterion means, with titles as they are now. */
export async function buildSnapshot(eventId: number, transaction?: Transaction): Promise<ResultsSnapshot> {
  const { rules, criteria, results, cars, entries } = await computeShowResults(eventId, transaction);
  const criterionName = new Map(criteria.map((c) => [c.id, c.name]));
  const line = (r: RankedEntry): SnapshotLine => {
    const car = cars.get(r.entryId) as ResultCar;
    return { entryId: r.entryId, number: car.number, title: car.title, code: car.code, classId: car.classId, className: car.className, place: r.place, shared: r.shared, total: r.total, decidedBy: decidedByWords(r.decidedBy, (id) => criterionName.get(id)), owner: car.owner };
  };
  const classOrder = [...new Map(entries.map((e) => [e.classId, e.eventClass?.position ?? 0]))].sort((a, b) => a[1] - b[1] || a[0] - b[0]).map(([id]) => id);
  const ranked = new Map<number, RankedEntry>();
  for (const r of results.bestOfShow) ranked.set(r.entryId, r);
  const classPlace = new Map<number, RankedEntry>();
  for (const c of results.classes) for (const r of c.ranking) classPlace.set(r.entryId, r);
  return ResultsSnapshotSchema.parse({
    publishedAt: new Date().toISOString(),
    rules,
    criteria: criteria.map((c) => ({ id: c.id, name: c.name, maxPoints: c.maxPoints, weight: Number(c.weight) })),
    classes: classOrder.map((classId) => {
      const c = results.classes.find((x) => x.classId === classId);
      return { classId, className: entries.find((e) => e.classId === classId)?.eventClass?.name ?? '', placings: (c?.placings ?? []).map(line) };
    }),
    bestOfShow: results.bestOfShow.map(line),
    peoplesChoice: await peoplesChoiceOf(eventId, cars, transaction),
    entries: entries.map((e) => {
      const r = classPlace.get(e.id) ?? ranked.get(e.id);
      const inClass = classPlace.get(e.id);
      return {
        entryId: e.id,
        number: e.number as number,
        classId: e.classId,
        place: inClass?.place ?? null,
        shared: inClass?.shared ?? false,
        total: r?.total ?? null,
        sheetsCounted: r?.sheetsCounted ?? 0,
        criterionMeans: Object.fromEntries(Object.entries(r?.criterionMeans ?? {}).map(([k, v]) => [String(k), v])),
      };
    }),
  });
}

/** The visitors' award, most votes wins and ties share it; the line's total is the number of votes. */
async function peoplesChoiceOf(eventId: number, cars: Map<number, ResultCar>, transaction?: Transaction): Promise<ResultsSnapshot['peoplesChoice']> {
  const { entryIds, votes } = await peoplesChoiceResult(eventId, transaction);
  const winners = entryIds.flatMap((id) => {
    const car = cars.get(id);
    return car ? [{ entryId: id, number: car.number, title: car.title, code: car.code, classId: car.classId, className: car.className, place: 1, shared: entryIds.length > 1, total: votes, decidedBy: `${votes} ${votes === 1 ? 'vote' : 'votes'}`, owner: car.owner }] : [];
  });
  return winners.length ? { votes, winners } : null;
}

/**
 * Publishing, inside the lifecycle step's transaction (the show row is locked, so no score slips in):
 * the results are stored as they are and every entrant's e-mail is queued; both exist only if the step commits.
 * While the review warns of anything (`publishWarnings`), the organiser must say to publish anyway.
 */
export async function publishResults(eventId: number, person: { id: number }, transaction: Transaction, options: { acknowledgeWarnings?: boolean | undefined } = {}): Promise<void> {
  const warnings = await publishWarnings(eventId, transaction);
  if (warnings.length && !options.acknowledgeWarnings) throw new ConflictError(UNACKNOWLEDGED_WARNINGS_MESSAGE, { acknowledgeWarnings: warnings.map(publishWarningWords).join(' ') });
  const snapshot = await buildSnapshot(eventId, transaction);
  await PublishedResults.upsert({ eventId, results: snapshot, publishedBy: person.id, publishedAt: new Date(snapshot.publishedAt) }, { transaction });
  await mailResultsToEntrants(eventId, snapshot, transaction);
}
