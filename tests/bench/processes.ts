// npm run bench -- processes: issue 24's throughput table. The public pages' requests per second
// with `npm start -- --web-processes 1` and with `--web-processes 2`, one after the other in the
// same run, each on the demo scenario (npm start's own), loopback only. Target: ≥ 1.6 × with two.
// The load generator runs on the same two cores, so on this machine it takes its share too: wrk (C) is used
// when it is there or can be installed, so that share is small; autocannon otherwise (the table says which).
import { spawn, type ChildProcess } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { visit, type Visit } from './lib/load';
import { ensureWrk, wrkVisit } from './lib/wrk';
import { getOnce, BROWSER_HEADERS } from './lib/bench-server';
import { median, ms, printTable, ratio, rate, repeat, sleep } from './lib/report';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const PORT = Number(process.env.BENCH_WEB_PORT ?? process.env.PORT ?? 3110);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 3);
const RUNS = Number(process.env.BENCH_RUNS ?? 3);
const CONNECTIONS = 100;
const base = `http://127.0.0.1:${PORT}`;
const WITH_WRK = ensureWrk();
const load = (paths: string[], seconds: number, at = base, connections = CONNECTIONS): Promise<Visit> => (WITH_WRK ? wrkVisit(at, paths, connections, seconds) : visit(at, paths, connections, seconds));

/** `npm start -- --web-processes n` in a process group of its own; resolves once /api/health answers 200. */
async function start(n: number, port = PORT, env: Record<string, string> = {}): Promise<{ child: ChildProcess; output: () => string }> {
  let output = '';
  const base = `http://127.0.0.1:${port}`;
  const child = spawn('npm', ['start', '--', '--web-processes', String(n)], {
    cwd: ROOT,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', LOG_LEVEL: 'warn', PAYMENTS_ONLINE: 'false', MAIL_CATCHER_PORT: process.env.PLACARD_TEST_MAIL_PORT ?? '0', NODE_ENV: 'development', API_RATE_LIMIT_PER_MINUTE: '10000000', ...env },
  });
  child.stdout!.on('data', (c: Buffer) => (output += c.toString()));
  child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
  const deadline = Date.now() + 180_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`npm start exited with ${child.exitCode}:\n${output}`);
    if (Date.now() > deadline) throw new Error(`npm start did not answer on ${base} within 3 minutes:\n${output}`);
    const ok = await getOnce(`${base}/api/health`).then((r) => r.status === 200 && /Placard is running/.test(output), () => false);
    if (ok) return { child, output: () => output };
    await sleep(500);
  }
}

/** CPU seconds used so far by every process of the group (from /proc: utime + stime, in clock ticks of 1/100 s). */
function groupCpuSeconds(pgid: number): number {
  let ticks = 0;
  for (const pid of readdirSync('/proc').filter((d) => /^\d+$/.test(d))) {
    try {
      const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').replace(/^.*\) /, '').split(' ');
      if (Number(fields[2]) === pgid) ticks += Number(fields[11]) + Number(fields[12]);
    } catch {
      // gone meanwhile
    }
  }
  return ticks / 100;
}

/**
 * Waits until the group has finished starting up (its processes together use under a fifth of a core
 * over a second), at most 30 s: web processes still compiling or a job queue still preparing would
 * otherwise be measured as the server's rate.
 */
async function settle(pgid: number): Promise<void> {
  const deadline = Date.now() + 30_000;
  let before = groupCpuSeconds(pgid);
  while (Date.now() < deadline) {
    await sleep(1000);
    const now = groupCpuSeconds(pgid);
    if (now - before < 0.2) return;
    before = now;
  }
}

/** Stops the whole group npm start made (npm, tsx, the primary and its web processes), by its id. */
async function stop(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const gone = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  process.kill(-child.pid!, 'SIGTERM');
  await Promise.race([gone, sleep(20_000)]);
  // Whatever is left of the group once the graceful stop had its time.
  try {
    process.kill(-child.pid!, 'SIGKILL');
  } catch {
    // already gone
  }
  await sleep(500);
}

/** The demo's public pages: the home page and the build and show pages it links to. */
async function publicPages(): Promise<string[]> {
  const home = (await getOnce(`${base}/`, { ...BROWSER_HEADERS, 'accept-encoding': 'identity' })).body.toString('utf8');
  const links = [...home.matchAll(/href="(\/(?:c|e)\/[^"?#]+)"/g)].map((m) => m[1]!);
  return ['/', ...new Set(links)].slice(0, 8);
}

async function measure(n: number): Promise<{ runs: Visit[]; pages: string[]; startedS: number; restarts: number }> {
  const t0 = performance.now();
  const { child, output } = await start(n);
  const startedS = (performance.now() - t0) / 1000;
  try {
    await settle(child.pid!);
    const pages = await publicPages();
    await load(pages, 5); // warm every process's page cache and JIT (each renders its own pages)
    const runs = await repeat(RUNS, () => load(pages, SECONDS));
    return { runs, pages, startedS, restarts: output().split('a web process stopped').length - 1 };
  } finally {
    await stop(child);
  }
}

/**
 * The machine's own ceiling, for reading the ratio: two independent `npm start -- --web-processes 1` (no
 * cluster, nothing shared but PostgreSQL and the machine) on two ports, each with its own load generator
 * and half the connections, at the same time. Their sum over one of them alone is what a second process
 * can add on these two cores, whatever the cluster module does.
 */
async function measureIndependentPair(): Promise<{ runs: Visit[]; pages: string[] }> {
  const first = await start(1);
  const second = await start(1, PORT + 1, { RUN_JOBS: 'false' });
  const otherBase = `http://127.0.0.1:${PORT + 1}`;
  try {
    await Promise.all([settle(first.child.pid!), settle(second.child.pid!)]);
    const pages = await publicPages();
    await Promise.all([load(pages, 5), load(pages, 5, otherBase)]);
    const runs = await repeat(RUNS, async () => {
      const [a, b] = await Promise.all([load(pages, SECONDS, base, CONNECTIONS / 2), load(pages, SECONDS, otherBase, CONNECTIONS / 2)]);
      return { ...a, rps: a.rps + b.rps, requests: a.requests + b.requests, errors: a.errors + b.errors, p50: Math.max(a.p50, b.p50), p99: Math.max(a.p99, b.p99), errorKinds: [a.errorKinds, b.errorKinds].filter(Boolean).join('; ') };
    });
    return { runs, pages };
  } finally {
    await stop(second.child);
    await stop(first.child);
  }
}

async function main() {
  const one = await measure(1);
  const two = await measure(2);
  const pair = await measureIndependentPair();
  const m = (runs: Visit[], pick: (v: Visit) => number) => median(runs.map(pick));
  const gain = m(two.runs, (v) => v.rps) / m(one.runs, (v) => v.rps);
  const errors = [...one.runs, ...two.runs].reduce((t, v) => t + v.errors, 0);
  printTable(`One web process or two (issue 24): ${CONNECTIONS} connections on the demo's public pages (${one.pages.length}: home, build and show pages), medians of ${RUNS} × ${SECONDS} s`, [
    ...[one, two].map((x, i) => ({
      what: `npm start -- --web-processes ${i + 1}`,
      measured: `${rate(m(x.runs, (v) => v.rps))} (runs: ${x.runs.map((v) => Math.round(v.rps)).join(', ')}), p50 ${ms(m(x.runs, (v) => v.p50))}, p99 ${ms(m(x.runs, (v) => v.p99))}; ready in ${x.startedS.toFixed(0)} s${x.restarts ? `, ${x.restarts} web processes restarted` : ''}${x.runs.some((v) => v.errors) ? `; errors: ${x.runs.map((v) => v.errorKinds).filter(Boolean).join('; ')}` : ''}`,
    })),
    { what: 'two processes / one', measured: `${ratio(gain)}${errors ? `, ${errors} errors` : ''}`, goal: '≥ 1.6 ×', met: gain >= 1.6 && errors === 0 },
    {
      what: 'the machine: two independent single processes / one',
      measured: `${ratio(m(pair.runs, (v) => v.rps) / m(one.runs, (v) => v.rps))} (${rate(m(pair.runs, (v) => v.rps))}, runs: ${pair.runs.map((v) => Math.round(v.rps)).join(', ')}; each its own load generator, ${CONNECTIONS / 2} connections)`,
    },
  ], [
    'Each is measured once its processes have finished starting (under a fifth of a core together for a second) and after 5 s of warm-up.',
    'The last row is the ceiling on this machine: two servers that share nothing but PostgreSQL, loaded at once: what a second process can add here, whatever the cluster module does.',
    WITH_WRK
      ? 'The load generator is wrk (one thread, C) on the same two cores as the server processes and PostgreSQL: it takes a small share of them.'
      : 'The load generator is autocannon on the same two cores as the server processes and PostgreSQL (wrk could not be installed): it takes about as much CPU per request as a server process, so two processes cannot have both cores to themselves.',
  ]);
}

await main();
process.exit(0);
