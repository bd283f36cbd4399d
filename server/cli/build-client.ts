import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
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
// The stamp names the kind of build too, so a development build left by an older version is rebuilt once.
const lockHash = () => `${existsSync(LOCK) ? createHash('sha256').update(readFileSync(LOCK)).digest('hex') : ''} production, maps apart`;
/** Source maps are written here, beside the served folder and never in it: for people reading a stack trace, not for visitors. */
export const SOURCE_MAPS_DIR = path.join(ROOT, 'dist/client-sourcemaps');

/**
 * The environment Vite builds in: always production, whatever NODE_ENV a person exported (Vite builds a
 * development client under NODE_ENV=development, in which the judges' and the gate's service workers are
 * never registered). NODE_ENV still decides how the server runs.
 */
export function viteBuildEnv(env: NodeJS.ProcessEnv = process.env): NodeJS.ProcessEnv {
  return { ...env, NODE_ENV: 'production' };
}

/** Moves every .map of the built client out of the served folder, keeping its relative path. */
export function moveSourceMaps(from: string, to: string): number {
  let moved = 0;
  for (const name of readdirSync(from)) {
    const file = path.join(from, name);
    if (statSync(file).isDirectory()) {
      moved += moveSourceMaps(file, path.join(to, name));
    } else if (name.endsWith('.map')) {
      mkdirSync(to, { recursive: true });
      renameSync(file, path.join(to, name));
      moved++;
    }
  }
  return moved;
}

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
  const r = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--mode', 'production', '--logLevel', 'warn'], { cwd: ROOT, stdio: 'inherit', env: viteBuildEnv() });
  if (r.status !== 0) throw new Error('The client build failed.');
  rmSync(SOURCE_MAPS_DIR, { recursive: true, force: true });
  moveSourceMaps(path.join(ROOT, 'dist/client'), SOURCE_MAPS_DIR);
  precompressFolder(path.join(ROOT, 'dist/client'));
  writeFileSync(LOCK_STAMP, lockHash());
}
