// npm run bench: the client JavaScript a person downloads, brotli-compressed as the server sends it.
// "Initial" is what an app address loads before anything else: the entry script and the modulepreloads named in
// the page the server sends for that address (server/client-shell.ts: index.html plus the screen's own chunks),
// for sign-in, a judge's cars and the gate. "Editor" is what opening a build adds on top of sign-in's: the
// build-editor page chunk and its static imports that the initial set does not already hold.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants as zlib } from 'node:zlib';
import { buildClientIfStale } from '@server/cli/build-client';
import { clientShellHtml } from '@server/client-shell';

const DIST = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../dist/client');
const EDITOR_SOURCE = 'src/features/builds/components/build-editor-page.tsx';
const TARGET_KB = { initial: 120, editor: 200 };

type Chunk = { file: string; imports?: string[]; isEntry?: boolean };
type Manifest = Record<string, Chunk>;

/** The brotli size of a built file: the .br the build wrote beside it, or compressed here the same way. */
function brotliBytes(file: string): number {
  const full = path.join(DIST, file);
  if (existsSync(`${full}.br`)) return readFileSync(`${full}.br`).length;
  const body = readFileSync(full);
  return brotliCompressSync(body, { params: { [zlib.BROTLI_PARAM_QUALITY]: 11, [zlib.BROTLI_PARAM_SIZE_HINT]: body.length } }).length;
}

/** Scripts the page for `address` makes the browser fetch at once: the entry and its modulepreloads. */
function initialFiles(address: string): string[] {
  const html = clientShellHtml(address);
  if (html === null) throw new Error('The client is not built.');
  const scripts = [...html.matchAll(/<script[^>]*type="module"[^>]*src="\/([^"]+\.js)"/g)].map((m) => m[1]!);
  const preloads = [...html.matchAll(/<link[^>]*rel="modulepreload"[^>]*href="\/([^"]+\.js)"/g)].map((m) => m[1]!);
  return [...new Set([...scripts, ...preloads])];
}

/** A chunk's file and every chunk it imports statically, following the manifest's graph. */
function withStaticImports(manifest: Manifest, key: string, seen = new Set<string>()): Set<string> {
  if (seen.has(key)) return seen;
  seen.add(key);
  for (const next of manifest[key]?.imports ?? []) withStaticImports(manifest, next, seen);
  return seen;
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

function report(name: string, files: string[], targetKb: number): boolean {
  const sizes = files.map((f) => ({ f, bytes: brotliBytes(f) })).sort((a, b) => b.bytes - a.bytes);
  const total = sizes.reduce((s, x) => s + x.bytes, 0);
  const ok = total < targetKb * 1024;
  console.log(`${name}: ${kb(total)} brotli (target < ${targetKb} KB) ${ok ? 'under target' : 'OVER TARGET'}`);
  for (const { f, bytes } of sizes) console.log(`  ${kb(bytes).padStart(9)}  ${f}`);
  return ok;
}

buildClientIfStale();
const manifest = JSON.parse(readFileSync(path.join(DIST, '.vite/manifest.json'), 'utf8')) as Manifest;
const initial = initialFiles('/sign-in');
if (!manifest[EDITOR_SOURCE]) throw new Error(`The build manifest has no ${EDITOR_SOURCE}: is the editor still its own chunk?`);
const editor = [...withStaticImports(manifest, EDITOR_SOURCE)].map((k) => manifest[k]!.file).filter((f) => !initial.includes(f));
console.log('Client JavaScript, compressed with brotli as served');
report('Initial (/sign-in)', initial, TARGET_KB.initial);
report("Initial (a judge's cars, /judge/<id>)", initialFiles('/judge/1'), TARGET_KB.initial);
report('Initial (the gate, /gate/<id>)', initialFiles('/gate/1'), TARGET_KB.initial);
report('Build editor (added on opening a build)', editor, TARGET_KB.editor);
