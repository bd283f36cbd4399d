import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mean } from 'mathjs';
import { CalcInputError } from '@shared/calc/errors';
import { computeResults, peoplesChoice, rankScores, scoreEntry, type ResultCriterion, type ResultRules, type ResultSheet } from '@shared/calc/results';

const crit = (id: number, maxPoints: number, weight = 1, tieBreakOrder: number | null = null): ResultCriterion => ({ id, maxPoints, weight, tieBreakOrder });
const sheet = (entryId: number, judgeId: number, points: Record<number, number>): ResultSheet => ({ entryId, judgeId, points });
const rules = (over: Partial<ResultRules> = {}): ResultRules => ({ trimFromSheets: null, placesPerClass: 3, bestOfShow: false, bestOfShowKeepsClassPlace: true, ...over });
const entry = (id: number, classId = 1, number = id) => ({ id, classId, number });

/** One sheet per judge giving every criterion the same points, so totals are easy to read. */
const flat = (entryId: number, perJudge: number[]) => perJudge.map((p, j) => sheet(entryId, j + 1, { 1: p }));

describe('an entry’s score', () => {
  it('is the weighted sum of the criterion means (worked example)', () => {
    // Rule: the design's "weighted sum over criteria of the mean of the judges" (common practice at shows).
    // By hand: means A (8+6)/2 = 7, B (7+9)/2 = 8, C (16+12)/2 = 14; total 1×7 + 2×8 + 0.5×14 = 30.
    const criteria = [crit(1, 10, 1), crit(2, 10, 2), crit(3, 20, 0.5)];
    const s = scoreEntry(entry(1), [sheet(1, 1, { 1: 8, 2: 7, 3: 16 }), sheet(1, 2, { 1: 6, 2: 9, 3: 12 })], criteria, null);
    expect(s.criterionMeans).toEqual({ 1: 7, 2: 8, 3: 14 });
    expect(s.total).toBe(30);
    expect(s.sheetsCounted).toBe(2);
  });

  it('drops the single highest and lowest sheet when five or more judges scored the car', () => {
    // Rule: with a panel of five, the highest and the lowest award are cancelled and the rest averaged
    // (from memory: World Aquatics diving rules for five-judge panels; the show chooses it per event).
    // By hand: 9, 7, 8, 3, 10 → drop 3 and 10 → (9 + 7 + 8) / 3 = 8; the plain mean would be 37 / 5 = 7.4.
    const criteria = [crit(1, 10)];
    const trimmed = scoreEntry(entry(1), flat(1, [9, 7, 8, 3, 10]), criteria, 5);
    expect(trimmed.total).toBe(8);
    expect(trimmed.sheetsCounted).toBe(3);
    expect(scoreEntry(entry(1), flat(1, [9, 7, 8, 3, 10]), criteria, null).total).toBeCloseTo(7.4, 12);
    // Four sheets: below the threshold, nothing is dropped: (9 + 7 + 8 + 3) / 4 = 6.75.
    expect(scoreEntry(entry(1), flat(1, [9, 7, 8, 3]), criteria, 5).total).toBe(6.75);
  });

  it('trims whole sheets by their weighted total, not each line on its own', () => {
    // Judge 5's sheet is lowest in total (2×1 + 9 = 11) though its line B is the highest B.
    // Kept: judges 1, 2, 4 (totals 15, 18, 21); dropped: judge 5 (11) and judge 3 (24).
    // Means A (5+6+7)/3 = 6, B (5+6+7)/3 = 6 → total 2×6 + 6 = 18.
    const criteria = [crit(1, 10, 2), crit(2, 10, 1)];
    const sheets = [
      sheet(1, 1, { 1: 5, 2: 5 }),
      sheet(1, 2, { 1: 6, 2: 6 }),
      sheet(1, 3, { 1: 8, 2: 8 }),
      sheet(1, 4, { 1: 7, 2: 7 }),
      sheet(1, 5, { 1: 1, 2: 9 }),
    ];
    expect(scoreEntry(entry(1), sheets, criteria, 5).total).toBe(18);
  });

  it('agrees with a reference library’s mean for any sheets (untrimmed)', () => {
    // Reference: mathjs `mean`, summed with the weights by hand.
    const criteria = [crit(1, 10, 1), crit(2, 20, 1.5), crit(3, 5, 0.25)];
    const points = fc.record({ 1: fc.integer({ min: 0, max: 10 }), 2: fc.integer({ min: 0, max: 20 }), 3: fc.integer({ min: 0, max: 5 }) });
    fc.assert(
      fc.property(fc.array(points, { minLength: 1, maxLength: 9 }), (pts) => {
        const s = scoreEntry(entry(1), pts.map((p, j) => sheet(1, j, p)), criteria, null);
        const expected = criteria.reduce((sum, c) => sum + c.weight * Number(mean(pts.map((p) => p[c.id as 1 | 2 | 3]))), 0);
        expect(s.total).toBeCloseTo(expected, 9);
      }),
    );
  });

  it('refuses points outside 0…max, a sheet with nothing to average and weights of zero', () => {
    expect(() => scoreEntry(entry(1), [sheet(1, 1, { 1: 11 })], [crit(1, 10)], null)).toThrow(CalcInputError);
    expect(() => scoreEntry(entry(1), [sheet(1, 1, { 1: -1 })], [crit(1, 10)], null)).toThrow(CalcInputError);
    expect(() => scoreEntry(entry(1), [sheet(1, 1, { 1: 5 })], [crit(1, 10)], 2)).toThrow(/at least 3/);
    expect(() => computeResults({ criteria: [crit(1, 10, 0)], entries: [entry(1)], sheets: [], rules: rules() })).toThrow(/weight/);
  });
});

describe('placings', () => {
  it('breaks a tie by the show’s first tie-break criterion', () => {
    // Rule: ties are broken by the show's ordered tie-break criteria (common practice at shows).
    // X: 9 + 6 = 15, Y: 7 + 8 = 15 → tied on total; criterion 1 (first tie-break) puts X first.
    const criteria = [crit(1, 10, 1, 1), crit(2, 10, 1, null)];
    const r = computeResults({ criteria, entries: [entry(1), entry(2)], sheets: [sheet(1, 1, { 1: 9, 2: 6 }), sheet(2, 1, { 1: 7, 2: 8 })], rules: rules() });
    const [first, second] = r.classes[0]!.placings;
    expect([first!.entryId, first!.place, second!.entryId, second!.place]).toEqual([1, 1, 2, 2]);
    expect(second!.decidedBy).toEqual({ kind: 'criterion', criterionId: 1 });
    expect(r.ties).toEqual([]);
  });

  it('goes on to the second tie-break criterion when the first is equal too', () => {
    const criteria = [crit(1, 10, 1, 2), crit(2, 10, 1, 1), crit(3, 10, 1, null)];
    // Totals 18 each; criterion 2 (first tie-break) equal at 6; criterion 1 (second) 7 vs 5 → entry 2 first.
    const sheets = [sheet(1, 1, { 1: 5, 2: 6, 3: 7 }), sheet(2, 1, { 1: 7, 2: 6, 3: 5 })];
    const ranking = computeResults({ criteria, entries: [entry(1), entry(2)], sheets, rules: rules() }).classes[0]!.ranking;
    expect(ranking.map((x) => x.entryId)).toEqual([2, 1]);
    expect(ranking[1]!.decidedBy).toEqual({ kind: 'criterion', criterionId: 1 });
  });

  it('leaves an unbreakable tie shared, skips the next place and tells the organiser', () => {
    // Standard competition ranking ("1224"): tied entries share a place and the next is skipped (from memory).
    const criteria = [crit(1, 10, 1, 1)];
    const sheets = [...flat(1, [9]), ...flat(2, [8]), ...flat(3, [8]), ...flat(4, [5])];
    const r = computeResults({ criteria, entries: [1, 2, 3, 4].map((id) => entry(id)), sheets, rules: rules() });
    const ranking = r.classes[0]!.ranking;
    expect(ranking.map((x) => [x.entryId, x.place, x.shared])).toEqual([[1, 1, false], [2, 2, true], [3, 2, true], [4, 4, false]]);
    expect(r.classes[0]!.placings.map((x) => x.entryId)).toEqual([1, 2, 3]);
    expect(r.ties).toEqual([{ scope: 'class', classId: 1, place: 2, entryIds: [2, 3] }]);
  });

  it('shares a third place between two cars, so four cars are placed', () => {
    const sheets = [...flat(1, [10]), ...flat(2, [9]), ...flat(3, [7]), ...flat(4, [7]), ...flat(5, [2])];
    const placings = computeResults({ criteria: [crit(1, 10)], entries: [1, 2, 3, 4, 5].map((id) => entry(id)), sheets, rules: rules() }).classes[0]!.placings;
    expect(placings.map((x) => [x.entryId, x.place])).toEqual([[1, 1], [2, 2], [3, 3], [4, 3]]);
  });

  it('follows the organiser’s recorded order for a tie the rules left', () => {
    const sheets = [...flat(1, [8]), ...flat(2, [8])];
    const r = computeResults({
      criteria: [crit(1, 10)],
      entries: [entry(1), entry(2)],
      sheets,
      rules: rules({ manualTieBreaks: [{ entryIds: [2, 1], reason: 'Head judge’s second look at panel fit' }] }),
    });
    const ranking = r.classes[0]!.ranking;
    expect(ranking.map((x) => [x.entryId, x.place])).toEqual([[2, 1], [1, 2]]);
    expect(ranking[1]!.decidedBy).toEqual({ kind: 'organiser', reason: 'Head judge’s second look at panel fit' });
    expect(r.ties).toEqual([]);
  });

  it('awards the configured number of places and lists cars with no sheet as not placed', () => {
    const sheets = [...flat(1, [9]), ...flat(2, [8]), ...flat(3, [7])];
    const c = computeResults({ criteria: [crit(1, 10)], entries: [1, 2, 3, 4].map((id) => entry(id)), sheets, rules: rules({ placesPerClass: 2 }) }).classes[0]!;
    expect(c.placings.map((x) => x.entryId)).toEqual([1, 2]);
    expect(c.unscored).toEqual([4]);
  });

  it('does not depend on the order sheets and entries arrive in', () => {
    const criteria = [crit(1, 10, 1.5, 1), crit(2, 10, 0.7, 2)];
    const pts = fc.integer({ min: 0, max: 10 });
    const arb = fc.array(fc.record({ entry: fc.integer({ min: 1, max: 6 }), a: pts, b: pts }), { minLength: 1, maxLength: 30 });
    fc.assert(
      fc.property(arb, fc.integer(), (raw, seed) => {
        const sheets = raw.map((r, j) => sheet(r.entry, j, { 1: r.a, 2: r.b }));
        const entries = [1, 2, 3, 4, 5, 6].map((id) => entry(id, id % 2));
        const shuffled = [...sheets].sort((x, y) => ((x.judgeId * 7919 + seed) % 13) - ((y.judgeId * 7919 + seed) % 13));
        const a = computeResults({ criteria, entries, sheets, rules: rules({ trimFromSheets: 5 }) });
        const b = computeResults({ criteria, entries: [...entries].reverse(), sheets: shuffled, rules: rules({ trimFromSheets: 5 }) });
        const places = (r: typeof a) => Object.fromEntries(r.classes.flatMap((c) => c.ranking.map((x) => [x.entryId, x.place])));
        expect(places(b)).toEqual(places(a));
      }),
    );
  });
});

describe('best of show', () => {
  // Class 1: P 9.0, Q 8.5, R 8.0, S 7.0; class 2: T 8.8, U 6.0. Best of show: P.
  const criteria = [crit(1, 10)];
  const entries = [entry(1, 1), entry(2, 1), entry(3, 1), entry(4, 1), entry(5, 2), entry(6, 2)];
  const sheets = [...flat(1, [9]), ...flat(2, [8.5]), ...flat(3, [8]), ...flat(4, [7]), ...flat(5, [8.8]), ...flat(6, [6])];

  it('goes to the highest score of the show; its winner keeps its class place when the show says so', () => {
    const r = computeResults({ criteria, entries, sheets, rules: rules({ bestOfShow: true, bestOfShowKeepsClassPlace: true }) });
    expect(r.bestOfShow.map((x) => x.entryId)).toEqual([1]);
    expect(r.classes.find((c) => c.classId === 1)!.placings.map((x) => x.entryId)).toEqual([1, 2, 3]);
  });

  it('takes its winner out of the class when the show says so: the others move up', () => {
    const r = computeResults({ criteria, entries, sheets, rules: rules({ bestOfShow: true, bestOfShowKeepsClassPlace: false }) });
    expect(r.bestOfShow.map((x) => x.entryId)).toEqual([1]);
    const class1 = r.classes.find((c) => c.classId === 1)!;
    expect(class1.placings.map((x) => [x.entryId, x.place])).toEqual([[2, 1], [3, 2], [4, 3]]);
    expect(r.classes.find((c) => c.classId === 2)!.placings.map((x) => x.entryId)).toEqual([5, 6]);
  });

  it('is shared and flagged when two cars of the show tie at the top', () => {
    const tied = [...flat(1, [9]), ...flat(5, [9]), ...flat(2, [5])];
    const r = computeResults({ criteria, entries: [entry(1, 1), entry(2, 1), entry(5, 2)], sheets: tied, rules: rules({ bestOfShow: true }) });
    expect(r.bestOfShow.map((x) => x.entryId)).toEqual([1, 5]);
    expect(r.ties).toContainEqual({ scope: 'best-of-show', classId: null, place: 1, entryIds: [1, 5] });
  });
});

describe('people’s choice', () => {
  it('goes to the most votes, shares a tie, and is not awarded with no votes', () => {
    // Rule: plurality vote, ties shared (common practice for a people's choice award).
    expect(peoplesChoice([{ entryId: 3, votes: 12 }, { entryId: 1, votes: 40 }, { entryId: 2, votes: 7 }])).toEqual({ entryIds: [1], votes: 40 });
    expect(peoplesChoice([{ entryId: 3, votes: 12 }, { entryId: 1, votes: 12 }])).toEqual({ entryIds: [1, 3], votes: 12 });
    expect(peoplesChoice([])).toEqual({ entryIds: [], votes: 0 });
  });
});

describe('ranking on its own', () => {
  it('puts the first car by what separated it from the second', () => {
    const criteria = [crit(1, 10, 1, 1), crit(2, 10)];
    const a = scoreEntry(entry(1), [sheet(1, 1, { 1: 9, 2: 1 })], criteria, null);
    const b = scoreEntry(entry(2), [sheet(2, 1, { 1: 2, 2: 8 })], criteria, null);
    const ranked = rankScores([b, a], criteria);
    expect(ranked.map((r) => [r.entryId, r.decidedBy.kind])).toEqual([[1, 'criterion'], [2, 'criterion']]);
  });
});
