import type { RankedEntry, ShowResults } from '@shared/calc/results';
import type { ResultLine, ResultsReview } from '@shared/schemas/judging';
import { decidedByWords, totalShown, type Award, type OwnResults, type AwardView, type ManualTieBreakView, type ResultsSnapshot, type SnapshotLine, type PublishWarning } from '@shared/schemas/results';
import type { ManualTieBreak } from '../models/manual-tie-break';
import type { ShowResultRules } from '@shared/schemas/judging';
import type { ReadOut } from '@shared/schemas/read-out';

type Cars = Map<number, { number: number; title: string; className: string }>;

const decided = (r: RankedEntry, criteria: Map<number, string>) => decidedByWords(r.decidedBy, (id) => criteria.get(id));

/** Totals stay unrounded in the computation; two decimals are for display only. */
function line(r: RankedEntry, cars: Cars, criteria: Map<number, string>): ResultLine {
  const car = cars.get(r.entryId);
  return { entryId: r.entryId, number: r.number, title: car?.title ?? '', className: car?.className ?? '', place: r.place, shared: r.shared, total: r.total, totalShown: r.total.toFixed(2), decidedBy: decided(r, criteria), sheets: r.sheetsCounted };
}

export function presentResultsReview(results: ShowResults, cars: Cars, criteria: Map<number, string>, classNames: Map<number, string>): ResultsReview {
  const numberOf = (id: number) => cars.get(id)?.number ?? 0;
  return {
    classes: results.classes.map((c) => ({ classId: c.classId, className: classNames.get(c.classId) ?? '', placings: c.placings.map((r) => line(r, cars, criteria)), unscored: c.unscored.length })),
    bestOfShow: results.bestOfShow.map((r) => line(r, cars, criteria)),
    ties: results.ties.map((t) => ({ scope: t.scope, classId: t.classId, place: t.place, numbers: t.entryIds.map(numberOf).sort((a, b) => a - b), cars: t.entryIds.map((entryId) => ({ entryId, number: numberOf(entryId), title: cars.get(entryId)?.title ?? '' })).sort((a, b) => a.number - b.number) })),
  };
}

export const presentAward = (a: Award): AwardView => ({ key: a.key, name: a.name, winners: a.winners.map((w) => ({ number: w.number, title: w.title, shared: w.shared })) });

export const presentTieBreak = (t: ManualTieBreak, by: string, cars: Cars): ManualTieBreakView => ({
  id: t.id,
  numbers: t.entryIds.map((id) => cars.get(id)?.number ?? 0),
  reason: t.reason,
  by,
  at: t.createdAt.toISOString(),
});

/** Once published, the organiser reviews what was published (the snapshot), not a recomputation. */
export function presentPublishedReview(r: ResultsSnapshot): ResultsReview {
  const sheets = new Map(r.entries.map((e) => [e.entryId, e.sheetsCounted]));
  const line = (l: SnapshotLine): ResultLine => ({ entryId: l.entryId, number: l.number, title: l.title, className: l.className, place: l.place, shared: l.shared, total: l.total, totalShown: totalShown(l.total), decidedBy: l.decidedBy, sheets: sheets.get(l.entryId) ?? 0 });
  return {
    classes: r.classes.map((c) => ({ classId: c.classId, className: c.className, placings: c.placings.map(line), unscored: r.entries.filter((e) => e.classId === c.classId && e.total === null).length })),
    bestOfShow: r.bestOfShow.map(line),
    ties: [],
  };
}

/** The organiser's review screen: the results (as they stand, or as published), the ties ordered by hand, the rules. */
export function presentResultsReviewReply(r: {
  results: ShowResults;
  cars: Cars;
  criteria: Map<number, string>;
  classNames: Map<number, string>;
  tieBreaks: Array<{ row: ManualTieBreak; by: string }>;
  published: ResultsSnapshot | null;
  rules: ShowResultRules;
  warnings: PublishWarning[];
}) {
  return {
    review: r.published ? presentPublishedReview(r.published) : presentResultsReview(r.results, r.cars, r.criteria, r.classNames),
    tieBreaks: r.tieBreaks.map((t) => presentTieBreak(t.row, t.by, r.cars)),
    rules: r.rules,
    published: r.published !== null,
    warnings: r.warnings.map((w): PublishWarning => ({ kind: w.kind, cars: w.cars.map((c) => ({ entryId: c.entryId, number: c.number, title: c.title, className: c.className })) })),
  };
}

export const presentNewTieBreak = (t: ManualTieBreak): { id: number; entryIds: number[]; reason: string } => ({ id: t.id, entryIds: t.entryIds, reason: t.reason });

/** A car's own results as its owner's screen shows them: every field named. */
export function presentOwnResults(r: OwnResults): OwnResults {
  return {
    entryId: r.entryId,
    number: r.number,
    showName: r.showName,
    className: r.className,
    place: r.place,
    shared: r.shared,
    placesAwarded: r.placesAwarded,
    bestOfShow: r.bestOfShow,
    total: r.total,
    sheetsCounted: r.sheetsCounted,
    criteria: r.criteria.map((c) => ({ name: c.name, maxPoints: c.maxPoints, weight: c.weight, mean: c.mean, judges: [...c.judges] })),
    comments: r.comments ? r.comments.map((c) => ({ criterion: c.criterion, text: c.text })) : null,
  };
}

/** The announcer's read-out: places, numbers, titles and the owner's public credit only (never the e-mail or any private field). */
export function presentReadOut(showName: string, sections: Array<{ kind: ReadOut['sections'][number]['kind']; className: string | null; lines: SnapshotLine[] }>): ReadOut {
  return {
    showName,
    sections: sections.map((s) => ({
      kind: s.kind,
      className: s.className,
      calls: s.lines.map((l) => ({ place: l.place, shared: l.shared, number: l.number, title: l.title, owner: l.owner ? { name: l.owner.name, hometown: l.owner.hometown, club: l.owner.club } : null })),
    })),
  };
}
