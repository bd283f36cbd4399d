// Visitors with wrk (Debian's package: a load generator written in C), for the benches that compare the
// server with itself on more cores. autocannon parses every answer in JavaScript and takes about as much
// CPU per request as the server it measures; on a 2-core machine that share is taken from the server.
// wrk's share is a small fraction of it. Installed on first use when we may (root), like the tests' tools.
import { spawn } from 'node:child_process';
import { installDebianPackages } from '@server/debian-packages';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { BROWSER_HEADERS } from './bench-server';
import type { Visit } from './load';

const WRK = '/usr/bin/wrk';

/** Whether wrk is there, installing Debian's package when missing and we are root. */
export function ensureWrk(): boolean {
  if (existsSync(WRK)) return true;
  if (process.getuid?.() !== 0) return false;
  console.log("Installing Debian's wrk for the bench…");
  installDebianPackages(['wrk']);
  return existsSync(WRK);
}

const lua = (s: string) => `"${s.replace(/[\\"]/g, (c) => `\\${c}`)}"`;

/** A wrk script: every connection walks `paths` in turn, with a browser's headers. */
function script(paths: string[], headers: Record<string, string>): string {
  return [
    `local paths = { ${paths.map(lua).join(', ')} }`,
    ...Object.entries(headers).map(([k, v]) => `wrk.headers[${lua(k)}] = ${lua(v)}`),
    'local i = 0',
    'request = function() i = i % #paths + 1; return wrk.format("GET", paths[i]) end',
  ].join('\n');
}

/** Milliseconds from wrk's "12.34ms" / "1.20s" / "850.00us". */
function millis(text: string | undefined): number {
  const m = /([\d.]+)(us|ms|s|m)\b/.exec(text ?? '');
  if (!m) return NaN;
  return Number(m[1]) * { us: 0.001, ms: 1, s: 1000, m: 60_000 }[m[2] as 'us' | 'ms' | 's' | 'm'];
}

/** wrk's output, once it has run. */
function runWrk(args: string[]): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(WRK, args, { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    child.stdout.on('data', (c: Buffer) => (out += c.toString()));
    child.stderr.on('data', (c: Buffer) => (err += c.toString()));
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolve(out) : reject(new Error(`wrk failed: ${err || out}`))));
  });
}

/** `connections` visitors on one wrk thread, asking for `paths` in turn for `seconds`. */
export async function wrkVisit(base: string, paths: string[], connections: number, seconds: number, headers: Record<string, string> = {}): Promise<Visit> {
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-wrk-'));
  try {
    const file = path.join(dir, 'walk.lua');
    writeFileSync(file, script(paths, { ...BROWSER_HEADERS, ...headers }));
    const out = await runWrk(['-t1', `-c${connections}`, `-d${seconds}s`, '--latency', '--timeout', '10s', '-s', file, base]);
    const rps = Number(/Requests\/sec:\s+([\d.]+)/.exec(out)?.[1]);
    const requests = Number(/(\d+) requests in/.exec(out)?.[1]);
    const socket = /Socket errors: connect (\d+), read (\d+), write (\d+), timeout (\d+)/.exec(out);
    const non2xx = Number(/Non-2xx or 3xx responses: (\d+)/.exec(out)?.[1] ?? 0);
    const [connect, read, write, timeout] = socket ? socket.slice(1).map(Number) : [0, 0, 0, 0];
    const kinds = [...(timeout ? [`${timeout} timed out (10 s)`] : []), ...(connect! + read! + write! ? [`${connect! + read! + write!} socket errors`] : []), ...(non2xx ? [`${non2xx} answers not 2xx/3xx`] : [])];
    return { rps, requests, p50: millis(/\s50%\s+(\S+)/.exec(out)?.[1]), p99: millis(/\s99%\s+(\S+)/.exec(out)?.[1]), errors: connect! + read! + write! + timeout! + non2xx, errorKinds: kinds.join(', ') };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
