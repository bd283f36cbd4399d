import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildFixture, CALLERS, type Fixture } from './fixture';
import { closeListening, runMatrix, type ForeignCell, type Row, type Tally } from './matrix';

const seconds = (u: NodeJS.CpuUsage) => (u.user + u.system) / 1e6;

/**
 * One file of the matrix: its own fixture (built once, shared by every cell), then every cell of its rows,
 * and a line with its route and cell counts and the worker's CPU time, fixture and cells apart.
 */
export function matrixFile(part: string, rows: Row[], foreign: ForeignCell[]) {
  let f: Fixture;
  let tally: Tally | undefined;
  let cpu: NodeJS.CpuUsage;
  let fixtureCpu = 0;
  beforeAll(async () => {
    cpu = process.cpuUsage();
    f = await buildFixture();
    fixtureCpu = seconds(process.cpuUsage(cpu));
  }, 60_000);
  afterAll(async () => {
    await closeListening();
    if (!tally) return;
    const cellsCpu = seconds(process.cpuUsage(cpu)) - fixtureCpu;
    console.log(`authorization matrix, ${part}: ${tally.routes} routes, ${tally.cells} cells, ${tally.foreign} foreign-id cells (CPU: fixture ${fixtureCpu.toFixed(1)} s, cells ${cellsCpu.toFixed(1)} s)`);
  });
  describe(`authorization matrix: ${part}`, () => {
    it(`answers each of ${rows.length} routes × ${CALLERS.length} callers (${rows.length * CALLERS.length} cells) and ${foreign.length} foreign-id cells as the table says`, { timeout: 120_000 }, async () => {
      tally = await runMatrix(f, rows, foreign);
      expect(tally.problems).toEqual([]);
    });
  });
}
