// Show results from judges' sheets: entry scores, class placings, best of show, ties.
// One pure module, so the organiser's review, the public page, the PDFs and the e-mails agree.
import { CalcInputError } from './errors';
import type {
  ClassResult,
  DecidedBy,
  EntryScore,
  ManualTieBreak,
  RankedEntry,
  ResultCriterion,
  ResultInput,
  ResultSheet,
  ShowResults,
  UnresolvedTie,
} from './results-types';

export * from './results-types';

/** Totals closer than this (relative) are equal: sums of weighted means carry float noise (0.1 + 0.2). */
const EPSILON = 1e-9;
const same = (a: number, b: number) => Math.abs(a - b) <= EPSILON * Math.max(1, Math.abs(a), Math.abs(b));

function checkCriteria(criteria: readonly ResultCriterion[]) {
  if (criteria.length === 0) throw new CalcInputError('criteria', 'the judging sheet has no criteria');
  for (const c of criteria) {
    if (!Number.isFinite(c.maxPoints) || c.maxPoints <= 0) throw new CalcInputError(`criteria.${c.id}.maxPoints`, 'must be greater than zero');
    if (!Number.isFinite(c.weight) || c.weight <= 0) throw new CalcInputError(`criteria.${c.id}.weight`, 'must be greater than zero');
  }
}

/** A sheet's weighted total: how the highest and lowest sheets are found for the trimmed mean. */
function sheetTotal(sheet: ResultSheet, criteria: readonly ResultCriterion[]): number {
  return criteria.reduce((sum, c) => sum + c.weight * (sheet.points[c.id] ?? 0), 0);
}

function checkSheet(sheet: ResultSheet, criteria: readonly ResultCriterion[]) {
  for (const c of criteria) {
    const p = sheet.points[c.id];
    if (p === undefined) continue; // a line left blank on a submitted sheet counts as 0 points
    if (!Number.isFinite(p) || p < 0 || p > c.maxPoints) {
      throw new CalcInputError(`sheets.${sheet.entryId}.${sheet.judgeId}.${c.id}`, `must be between 0 and ${c.maxPoints}`);
    }
  }
}

/**
 * One car's score: the weighted sum over criteria of the mean points of its submitted sheets.
 * With `trimFromSheets` sheets or more, the single highest and lowest sheet (by weighted total) are dropped first.
 */
export function scoreEntry(
  entry: { id: number; classId: number; number: number },
  sheets: readonly ResultSheet[],
  criteria: readonly ResultCriterion[],
  trimFromSheets: number | null,
): EntryScore {
  if (trimFromSheets !== null && (!Number.isInteger(trimFromSheets) || trimFromSheets < 3)) {
    throw new CalcInputError('trimFromSheets', 'must be a whole number of at least 3, so a sheet is left after trimming');
  }
  for (const s of sheets) checkSheet(s, criteria);
  let counted = [...sheets];
  if (trimFromSheets !== null && sheets.length >= trimFromSheets) {
    // Ties between sheet totals: the lower judge id goes first, so the same sheets are always dropped.
    counted = counted
      .map((s) => ({ s, total: sheetTotal(s, criteria) }))
      .sort((a, b) => a.total - b.total || a.s.judgeId - b.s.judgeId)
      .slice(1, -1)
      .map((x) => x.s);
  }
  const criterionMeans: Record<number, number> = {};
  let total = 0;
  for (const c of criteria) {
    const mean = counted.length ? counted.reduce((sum, s) => sum + (s.points[c.id] ?? 0), 0) / counted.length : 0;
    criterionMeans[c.id] = mean;
    total += c.weight * mean;
  }
  return { entryId: entry.id, classId: entry.classId, number: entry.number, sheetsSubmitted: sheets.length, sheetsCounted: counted.length, criterionMeans, total };
}

type Separation = { order: number; by: DecidedBy };

/** How two scores compare: higher total first, then the tie-break criteria in order, then the organiser's order. */
function separate(a: EntryScore, b: EntryScore, tieBreakers: readonly ResultCriterion[], manual: readonly ManualTieBreak[]): Separation {
  if (!same(a.total, b.total)) return { order: b.total - a.total, by: { kind: 'score' } };
  for (const c of tieBreakers) {
    const ma = a.criterionMeans[c.id] ?? 0;
    const mb = b.criterionMeans[c.id] ?? 0;
    if (!same(ma, mb)) return { order: mb - ma, by: { kind: 'criterion', criterionId: c.id } };
  }
  for (const m of manual) {
    const ia = m.entryIds.indexOf(a.entryId);
    const ib = m.entryIds.indexOf(b.entryId);
    if (ia >= 0 && ib >= 0 && ia !== ib) return { order: ia - ib, by: { kind: 'organiser', reason: m.reason } };
  }
  return { order: 0, by: { kind: 'shared' } };
}

/** Orders scores and gives places by standard competition ranking (1, 2, 2, 4). */
export function rankScores(
  scores: readonly EntryScore[],
  criteria: readonly ResultCriterion[],
  manual: readonly ManualTieBreak[] = [],
): RankedEntry[] {
  const tieBreakers = criteria
    .filter((c) => c.tieBreakOrder !== null)
    .sort((a, b) => (a.tieBreakOrder ?? 0) - (b.tieBreakOrder ?? 0));
  const sorted = [...scores].sort((a, b) => separate(a, b, tieBreakers, manual).order || a.number - b.number);
  // What separates each car from the next one down; the last car has nobody below.
  const vsNext = sorted.map((score, i) => (i + 1 < sorted.length ? separate(score, sorted[i + 1]!, tieBreakers, manual) : undefined));
  const ranked: RankedEntry[] = [];
  sorted.forEach((score, i) => {
    const above = ranked[i - 1];
    const vsAbove = i > 0 ? vsNext[i - 1] : undefined;
    const tiedAbove = vsAbove?.order === 0;
    const tiedBelow = vsNext[i]?.order === 0;
    const decidedBy: DecidedBy = vsAbove?.by ?? vsNext[i]?.by ?? { kind: 'score' };
    ranked.push({ ...score, place: tiedAbove && above ? above.place : i + 1, shared: tiedAbove || tiedBelow, decidedBy });
  });
  return ranked;
}

/** Groups of shared places at or above `lastPlace`, for the organiser to look at. */
function sharedPlaces(ranked: readonly RankedEntry[], lastPlace: number, scope: UnresolvedTie['scope'], classId: number | null): UnresolvedTie[] {
  const byPlace = new Map<number, number[]>();
  for (const r of ranked) if (r.shared && r.place <= lastPlace) byPlace.set(r.place, [...(byPlace.get(r.place) ?? []), r.entryId]);
  return [...byPlace].map(([place, entryIds]) => ({ scope, classId, place, entryIds }));
}

/** The whole show: every class placed, best of show, and the ties the organiser should see. */
export function computeResults(input: ResultInput): ShowResults {
  const { criteria, entries, sheets, rules } = input;
  checkCriteria(criteria);
  if (!Number.isInteger(rules.placesPerClass) || rules.placesPerClass < 1) throw new CalcInputError('placesPerClass', 'must be a whole number of at least 1');
  const manual = rules.manualTieBreaks ?? [];
  const sheetsByEntry = new Map<number, ResultSheet[]>();
  for (const s of sheets) {
    const own = sheetsByEntry.get(s.entryId);
    if (own) own.push(s);
    else sheetsByEntry.set(s.entryId, [s]);
  }

  const scored: EntryScore[] = [];
  const unscored = new Map<number, number[]>();
  for (const e of entries) {
    const own = sheetsByEntry.get(e.id) ?? [];
    if (own.length) scored.push(scoreEntry(e, own, criteria, rules.trimFromSheets));
    else unscored.set(e.classId, [...(unscored.get(e.classId) ?? []), e.id]); // few: only cars nobody scored
  }

  const bestOfShow = rules.bestOfShow ? rankScores(scored, criteria, manual).filter((r) => r.place === 1) : [];
  const removed = new Set(rules.bestOfShowKeepsClassPlace ? [] : bestOfShow.map((r) => r.entryId));
  const ties: UnresolvedTie[] = rules.bestOfShow ? sharedPlaces(bestOfShow, 1, 'best-of-show', null) : [];

  const byClass = new Map<number, EntryScore[]>(entries.map((e) => [e.classId, []]));
  for (const s of scored) if (!removed.has(s.entryId)) byClass.get(s.classId)!.push(s);
  const classes: ClassResult[] = [...byClass].map(([classId, classScores]) => {
    const ranking = rankScores(classScores, criteria, manual);
    ties.push(...sharedPlaces(ranking, rules.placesPerClass, 'class', classId));
    return { classId, ranking, placings: ranking.filter((r) => r.place <= rules.placesPerClass), unscored: unscored.get(classId) ?? [] };
  });
  return { classes, bestOfShow, ties };
}

/** People's choice: the most votes wins; equal counts share the award. No votes, no award. */
export function peoplesChoice(tally: ReadonlyArray<{ entryId: number; votes: number }>): { entryIds: number[]; votes: number } {
  const top = Math.max(0, ...tally.map((t) => t.votes));
  if (top === 0) return { entryIds: [], votes: 0 };
  return { entryIds: tally.filter((t) => t.votes === top).map((t) => t.entryId).sort((a, b) => a - b), votes: top };
}
