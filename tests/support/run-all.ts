// `npm test`: what a fresh machine lacks (PostgreSQL, Debian's chromium), a current client build,
// then every test (unit, API, browser) against the test database. Exits non-zero on any failure.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDatabase } from '@server/db/cluster';
import { buildClientIfStale } from '@server/cli/build-client';
import { CHROMIUM } from './browser';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  if (process.getuid?.() !== 0) throw new Error(`${CHROMIUM} is missing: install Debian's chromium package (apt-get install chromium).`);
  console.log("Installing Debian's chromium for the browser tests…");
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', 'chromium']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed`);
  }
}

ensureChromium();
await ensureDatabase();
buildClientIfStale();
const vitest = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/vitest/vitest.mjs'), 'run', ...process.argv.slice(2)], { cwd: ROOT, stdio: 'inherit' });
process.exit(vitest.status ?? 1);
