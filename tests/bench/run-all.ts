// `npm run bench`: every benchmark in this folder, one after another, each printing its own figures.
// A benchmark is any other .ts file here; they run in separate processes so one's warm-up never helps another.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const tsx = path.resolve(here, '../../node_modules/.bin/tsx');
const only = process.argv.slice(2);
const benches = readdirSync(here)
  .filter((f) => f.endsWith('.ts') && f !== 'run-all.ts')
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();
let failed = 0;
for (const file of benches) {
  const r = spawnSync(tsx, [path.join(here, file)], { stdio: 'inherit' });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
