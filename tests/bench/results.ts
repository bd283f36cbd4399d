// Results of a large show: 500 entries × 5 judges × 8 criteria, trimmed mean, best of show.
// Target (from the judging issue): under 50 ms. Prints the median and worst of repeated runs.
import { computeResults, type ResultCriterion, type ResultSheet } from '@shared/calc/results';

const ENTRIES = 500;
const JUDGES = 5;
const CRITERIA = 8;
const RUNS = 30;

/** A small deterministic generator, so every run scores the same invented show. */
function lcg(seed: number) {
  let s = seed;
  return () => ((s = (s * 1664525 + 1013904223) % 4294967296) / 4294967296);
}

const rand = lcg(42);
const criteria: ResultCriterion[] = Array.from({ length: CRITERIA }, (_, i) => ({ id: i + 1, maxPoints: 10, weight: i < 2 ? 2 : 1, tieBreakOrder: i < 3 ? i + 1 : null }));
const entries = Array.from({ length: ENTRIES }, (_, i) => ({ id: i + 1, classId: (i % 6) + 1, number: i + 1 }));
const sheets: ResultSheet[] = entries.flatMap((e) =>
  Array.from({ length: JUDGES }, (_, j) => ({ entryId: e.id, judgeId: j + 1, points: Object.fromEntries(criteria.map((c) => [c.id, Math.floor(rand() * 11)])) })),
);
const rules = { trimFromSheets: 5, placesPerClass: 3, bestOfShow: true, bestOfShowKeepsClassPlace: false };

const times: number[] = [];
for (let i = 0; i < RUNS; i++) {
  const t0 = performance.now();
  computeResults({ criteria, entries, sheets, rules });
  times.push(performance.now() - t0);
}
times.sort((a, b) => a - b);
const median = times[Math.floor(RUNS / 2)]!;
console.log(`\nShow results, ${ENTRIES} entries × ${JUDGES} judges × ${CRITERIA} criteria (${RUNS} runs)`);
console.log(`  median ${median.toFixed(1)} ms, worst ${times[RUNS - 1]!.toFixed(1)} ms (the cold first run included); target under 50 ms: ${median < 50 ? 'met' : 'NOT met'}`);
