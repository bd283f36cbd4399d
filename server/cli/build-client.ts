import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { precompressFolder } from './precompress';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const BUILT = path.join(ROOT, 'dist/client/index.html');
// templates/charts: the dyno chart and the engineering sketches are drawn by the browser too.
const SOURCES = ['client', 'shared', 'templates/charts', 'vite.config.ts', 'server/cli/precompress.ts'];
// npm install rewrites the lock file even when nothing changed, so dependencies are compared by content.
const LOCK = path.join(ROOT, 'package-lock.json');
const LOCK_STAMP = path.join(ROOT, 'dist/client/.lock-sha256');
const lockHash = () => (existsSync(LOCK) ? createHash('sha256').update(readFileSync(LOCK)).digest('hex') : '');

function newestMtime(p: string): number {
  if (!existsSync(p)) return 0;
  const s = statSync(p);
  if (!s.isDirectory()) return s.mtimeMs;
  return readdirSync(p).reduce((m, name) => Math.max(m, newestMtime(path.join(p, name))), s.mtimeMs);
}

/** Builds the client with Vite when one of its sources is newer than the last build, or the dependencies changed. */
export function buildClientIfStale(): void {
  const built = existsSync(BUILT) ? statSync(BUILT).mtimeMs : 0;
  const newest = Math.max(...SOURCES.map((s) => newestMtime(path.join(ROOT, s))));
  const sameDependencies = existsSync(LOCK_STAMP) && readFileSync(LOCK_STAMP, 'utf8') === lockHash();
  if (built >= newest && sameDependencies) return;
  console.log('Building the client…');
  const r = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], { cwd: ROOT, stdio: 'inherit' });
  if (r.status !== 0) throw new Error('The client build failed.');
  precompressFolder(path.join(ROOT, 'dist/client'));
  writeFileSync(LOCK_STAMP, lockHash());
}
