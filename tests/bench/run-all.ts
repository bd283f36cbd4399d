// `npm run bench`: every benchmark in this folder, one after another, each printing its own table.
// A benchmark is any other .ts file here (helpers live in lib/); they run in separate processes so
// one's warm-up never helps another. `npm run bench -- showday weak` runs those whose file name
// contains a word given (sections: morning, showday, weak, growth, processes, and the older ones).
// A plain run takes every section in the order below, with shorter phases where a bench offers them
// (BENCH_ALL=1), and shares the weak-link timings with the show-morning table (BENCH_RUN_DIR).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const tsx = path.resolve(here, '../../node_modules/.bin/tsx');
const only = process.argv.slice(2);
// Weak link first: the show-morning table reuses its sign-in, judge and gate timings.
const ORDER = ['weak-link.ts', 'morning.ts', 'showday.ts', 'growth.ts', 'processes.ts'];
const rank = (f: string) => (ORDER.includes(f) ? ORDER.indexOf(f) : ORDER.length);
const benches = readdirSync(here)
  .filter((f) => f.endsWith('.ts') && f !== 'run-all.ts')
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort((a, b) => rank(a) - rank(b) || a.localeCompare(b));
if (benches.length === 0) {
  console.error(`No bench matches ${only.join(', ')}.`);
  process.exit(1);
}
const runDir = mkdtempSync(path.join(os.tmpdir(), 'placard-bench-run-'));
const env = { ...process.env, BENCH_RUN_DIR: runDir, ...(only.length === 0 ? { BENCH_ALL: '1' } : {}) };
const t0 = performance.now();
let failed = 0;
for (const file of benches) {
  const started = performance.now();
  const r = spawnSync(tsx, [path.join(here, file)], { stdio: 'inherit', env });
  console.log(`(${file}: ${((performance.now() - started) / 1000).toFixed(0)} s${r.status !== 0 ? `, FAILED with ${r.status ?? r.signal}` : ''})`);
  if (r.status !== 0) failed++;
}
rmSync(runDir, { recursive: true, force: true });
console.log(`\nnpm run bench: ${benches.length} benches in ${((performance.now() - t0) / 1000).toFixed(0)} s; load average now ${os.loadavg().map((l) => l.toFixed(2)).join(' ')} on ${os.cpus().length} cores`);
process.exit(failed ? 1 : 0);
