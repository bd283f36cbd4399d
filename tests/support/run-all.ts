// `npm test`: what a fresh machine lacks (PostgreSQL, Debian's chromium), a current client build,
// then every test project (unit, api, isolated, browser, slow) against the test database.
// Exits non-zero on any failure, and prints the time each project took. Lint and typecheck (the layer
// rules live there) are `npm run check`, which CI runs after the tests; PLACARD_CHECKS=1 runs them
// beside the tests as well. `npm test -- <files>` (or `--project <name>`) runs just those;
// `npm run test:quick` is the unit and api projects.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDatabase } from '@server/db/cluster';
import { buildClientIfStale } from '@server/cli/build-client';
import { installDebianPackages } from '@server/debian-packages';
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
  installDebianPackages(missing);
}

type Outcome = { name: string; status: number; seconds: number; output: string };

/** Runs a tool from node_modules/.bin beside the tests, keeping its output for the end of the run. */
function runBeside(name: string, bin: string, args: string[]): Promise<Outcome> {
  const started = Date.now();
  return new Promise((resolve) => {
    let output = '';
    // At the lowest priority: the tests come first on a small machine, the checks take what they leave.
    const child = spawn('nice', ['-n', '19', path.join(ROOT, 'node_modules/.bin', bin), ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout.on('data', (c: Buffer) => (output += c.toString()));
    child.stderr.on('data', (c: Buffer) => (output += c.toString()));
    child.on('error', (err) => resolve({ name, status: 1, seconds: (Date.now() - started) / 1000, output: String(err) }));
    child.on('close', (code) => resolve({ name, status: code ?? 1, seconds: (Date.now() - started) / 1000, output }));
  });
}

/** Runs vitest in its own process, its output straight to ours. */
function runTests(args: string[]): Promise<Outcome> {
  const started = Date.now();
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [path.join(ROOT, 'node_modules/vitest/vitest.mjs'), 'run', ...args], { cwd: ROOT, stdio: 'inherit' });
    child.on('close', (code) => resolve({ name: 'tests', status: code ?? 1, seconds: (Date.now() - started) / 1000, output: '' }));
  });
}

const runStarted = Date.now();
const args = process.argv.slice(2);
// Lint and typecheck run in CI after the tests (`.ci/run`, `npm run check`); PLACARD_CHECKS=1 runs them here too.
const withChecks = process.env.PLACARD_CHECKS === '1';

ensureTools();
await ensureDatabase();
buildClientIfStale();

// Lint and typecheck share the machine with the tests, niced, so they fill the time the tests spend
// waiting on the database and the browser; their caches make a second run take seconds.
const checks = withChecks
  ? [
      runBeside('lint', 'eslint', ['.', '--cache', '--cache-location', 'node_modules/.cache/eslint/', '--cache-strategy', 'content']),
      runBeside('typecheck', 'tsc', ['-b']),
    ]
  : [];
const outcomes = [await runTests(args), ...(await Promise.all(checks))];

for (const o of outcomes.filter((o) => o.name !== 'tests' && (o.status !== 0 || o.output.trim()))) {
  console.log(`\nnpm test: ${o.name} ${o.status === 0 ? 'passed with warnings' : 'FAILED'}:\n${o.output.trim()}`);
}
console.log('\nnpm test:');
for (const o of outcomes) console.log(`  ${o.name.padEnd(10)} ${o.status === 0 ? 'passed' : 'FAILED'} in ${o.seconds.toFixed(1)} s`);
console.log(`  all        ${((Date.now() - runStarted) / 1000).toFixed(1)} s from the start of npm test`);
process.exit(outcomes.every((o) => o.status === 0) ? 0 : 1);
