// `npm test`: lint and typecheck (the layer rules live there), what a fresh machine lacks
// (PostgreSQL, Debian's chromium), a current client build, then every test (unit, API, browser)
// against the test database. Exits non-zero on any failure.
// `npm test -- <files>` runs just those files and skips lint and typecheck (they take a minute or
// two on this machine); PLACARD_CHECKS=1 runs them there too.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDatabase } from '@server/db/cluster';
import { buildClientIfStale } from '@server/cli/build-client';
import { CHROMIUM } from './browser';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

// Debian packages the tests need: the browser for journeys, poppler to print cards to pixels and read their QR codes, ffmpeg for the fake camera.
const TOOLS = [
  { binary: CHROMIUM, pkg: 'chromium' },
  { binary: '/usr/bin/pdftoppm', pkg: 'poppler-utils' },
  // The gate test turns a card into a fake camera's video clip.
  { binary: '/usr/bin/ffmpeg', pkg: 'ffmpeg' },
];

function ensureTools() {
  const missing = TOOLS.filter((t) => !existsSync(t.binary)).map((t) => t.pkg);
  if (!missing.length) return;
  if (process.getuid?.() !== 0) throw new Error(`Missing Debian packages for the tests: ${missing.join(', ')} (apt-get install ${missing.join(' ')}).`);
  console.log(`Installing Debian's ${missing.join(' and ')} for the tests…`);
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', ...missing]]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed`);
  }
}

/** Runs an npm script's tool from node_modules/.bin; a failure ends the run before any test starts. */
function check(name: string, bin: string, args: string[]) {
  console.log(`npm test: ${name}…`);
  const r = spawnSync(path.join(ROOT, 'node_modules/.bin', bin), args, { cwd: ROOT, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error(`npm test: ${name} failed, so no test ran.`);
    process.exit(r.status ?? 1);
  }
}

const targeted = process.argv.slice(2).some((a) => !a.startsWith('-'));
if (!targeted || process.env.PLACARD_CHECKS === '1') {
  check('lint', 'eslint', ['.']);
  check('typecheck', 'tsc', ['-b']);
}

ensureTools();
await ensureDatabase();
buildClientIfStale();
const vitest = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/vitest/vitest.mjs'), 'run', ...process.argv.slice(2)], { cwd: ROOT, stdio: 'inherit' });
process.exit(vitest.status ?? 1);
