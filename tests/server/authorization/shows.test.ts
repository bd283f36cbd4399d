import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildFixture, type Fixture } from './fixture';
import { closeListening, runMatrix, type Tally } from './matrix';
import { SHOW_FOREIGN, SHOW_ROWS } from './rows-shows';

// Part of the authorization matrix (matrix.ts): every route of running show A, its people, entering,
// the entry table and the gate, asked by every kind of caller; refused requests change no row.
let f: Fixture;
let tally: Tally | undefined;
let cpu: NodeJS.CpuUsage;
beforeAll(async () => {
  cpu = process.cpuUsage();
  f = await buildFixture();
}, 60_000);
afterAll(async () => {
  await closeListening();
  if (tally) console.log(`authorization matrix, shows: ${tally.routes} routes, ${tally.cells} cells, ${tally.foreign} foreign-id cells (${((process.cpuUsage(cpu).user + process.cpuUsage(cpu).system) / 1e6).toFixed(1)} s of this worker's CPU)`);
});

describe('authorization matrix: shows', () => {
  it(`answers each of ${SHOW_ROWS.length} routes × 15 callers as the table says`, { timeout: 300_000 }, async () => {
    tally = await runMatrix(f, SHOW_ROWS, SHOW_FOREIGN);
    expect(tally.problems).toEqual([]);
  });
});
