import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildFixture, type Fixture } from './fixture';
import { closeListening, runMatrix, type Tally } from './matrix';
import { JUDGING_FOREIGN, JUDGING_ROWS } from './rows-judging';

// Part of the authorization matrix (matrix.ts): every route of show A's judging, numbered cards,
// people's choice and results, asked by every kind of caller; refused requests change no row.
let f: Fixture;
let tally: Tally | undefined;
let cpu: NodeJS.CpuUsage;
beforeAll(async () => {
  cpu = process.cpuUsage();
  f = await buildFixture();
}, 60_000);
afterAll(async () => {
  await closeListening();
  if (tally) console.log(`authorization matrix, judging and results: ${tally.routes} routes, ${tally.cells} cells, ${tally.foreign} foreign-id cells (${((process.cpuUsage(cpu).user + process.cpuUsage(cpu).system) / 1e6).toFixed(1)} s of this worker's CPU)`);
});

describe('authorization matrix: judging and results', () => {
  it(`answers each of ${JUDGING_ROWS.length} routes × 15 callers as the table says`, { timeout: 300_000 }, async () => {
    tally = await runMatrix(f, JUDGING_ROWS, JUDGING_FOREIGN);
    expect(tally.problems).toEqual([]);
  });
});
