import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildFixture, type Fixture } from './fixture';
import { closeListening, runMatrix, type Tally } from './matrix';
import { PEOPLE_FOREIGN, PEOPLE_ROWS } from './rows-people';
import { BUILD_FOREIGN, BUILD_ROWS } from './rows-builds';

// Part of the authorization matrix (matrix.ts): every route of sessions, accounts, the site admin, the
// public pages and the owner's builds, asked by every kind of caller; refused requests change no row.
let f: Fixture;
let tally: Tally | undefined;
let cpu: NodeJS.CpuUsage;
beforeAll(async () => {
  cpu = process.cpuUsage();
  f = await buildFixture();
}, 60_000);
afterAll(async () => {
  await closeListening();
  if (tally) console.log(`authorization matrix, people and builds: ${tally.routes} routes, ${tally.cells} cells, ${tally.foreign} foreign-id cells (${((process.cpuUsage(cpu).user + process.cpuUsage(cpu).system) / 1e6).toFixed(1)} s of this worker's CPU)`);
});

describe('authorization matrix: people and builds', () => {
  it(`answers each of ${PEOPLE_ROWS.length + BUILD_ROWS.length} routes × 15 callers as the table says`, { timeout: 300_000 }, async () => {
    tally = await runMatrix(f, [...PEOPLE_ROWS, ...BUILD_ROWS], [...PEOPLE_FOREIGN, ...BUILD_FOREIGN]);
    expect(tally.problems).toEqual([]);
  });
});
