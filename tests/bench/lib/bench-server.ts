// The server the benches measure, in a child process of its own (so autocannon in the parent never
// shares its thread), on a database of its own whose schema is made afresh each run. It seeds the
// scenario asked for (lib/scenario.ts), serves the real app, and beside it `/bench-static/`: copies of
// pages as static files (express-static-gzip over the very bytes the page route sent, so a
// "same bytes as a static file" ratio compares like with like, compression included).
import { fork, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import http from 'node:http';
import { fileURLToPath } from 'node:url';
import type { AddressInfo } from 'node:net';
import type { Person, SeededShow } from './scenario';

/** What to seed: shows of these sizes (in show day), and the show morning (a show being judged, its people, a full build). */
export type ScenarioSpec = { sizes?: number[]; morning?: { entries: number; checkedIn: number; judges: number } };
export type Scenario = {
  organiser: Person;
  judges: Person[];
  gate: Person;
  password: string;
  /** Shows by size, in show day. */
  sized: Record<number, SeededShow>;
  /** The show being judged, people's choice open (with `morning`). */
  morning?: SeededShow;
  /** Build pages: the first is a complete build entered in the morning show (its page carries the vote box). */
  buildCodes: string[];
};
export type Snapshot = { staticPath: string; bytes: number; encodedBytes: number; encoding: string };
export type BenchServer = { base: string; pid: number; scenario: Scenario; child: ChildProcess; snapshot: (pagePath: string) => Promise<Snapshot>; memory: () => Promise<NodeJS.MemoryUsage>; stop: () => Promise<void> };

/** A browser's request headers for a page (accept-encoding as Chromium sends it, less zstd, which the server does not offer). */
export const BROWSER_HEADERS = { 'accept-encoding': 'gzip, deflate, br', 'accept-language': 'en-GB,en;q=0.9', accept: 'text/html,application/xhtml+xml' };

export async function startBenchServer(database: string, spec: ScenarioSpec, env: Record<string, string> = {}): Promise<BenchServer> {
  let output = '';
  const child = fork(fileURLToPath(import.meta.url), ['--serve'], {
    // BENCH_CPU_PROF=<folder>: the server writes a V8 CPU profile there when it stops (open it in Chromium's DevTools).
    // BENCH_NODE_FLAGS: more flags for the server's node (V8 settings to try, say), separated by spaces.
    execArgv: ['--import', 'tsx', ...(process.env.BENCH_CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_CPU_PROF}`] : []), ...(process.env.BENCH_NODE_FLAGS?.split(' ').filter(Boolean) ?? [])],
    env: {
      ...process.env,
      TSX_TSCONFIG_PATH: 'server/tsconfig.runtime.json',
      NODE_ENV: 'test',
      DB_NAME: database,
      DEMO_MODE: 'false',
      LOG_LEVEL: 'warn',
      // The bench compresses a morning's requests into seconds from one address: the per-address limits
      // would measure themselves, not the server (they have tests of their own).
      API_RATE_LIMIT_PER_MINUTE: '10000000',
      SIGNIN_RATE_LIMIT: '100000',
      SIGNIN_ADDRESS_RATE_LIMIT: '100000',
      BENCH_SCENARIO: JSON.stringify(spec),
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
  });
  child.stdout!.on('data', (c: Buffer) => (output += c.toString()));
  child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
  const ready = await new Promise<{ port: number; scenario: Scenario }>((resolve, reject) => {
    child.once('message', (m) => resolve(m as { port: number; scenario: Scenario }));
    child.once('exit', (code) => reject(new Error(`the bench server exited with ${code} before listening:\n${output}`)));
  });
  let next = 0;
  const pending = new Map<number, (v: unknown) => void>();
  child.on('message', (m: { id?: number; result?: unknown }) => m.id !== undefined && pending.get(m.id)?.(m.result));
  const ask = <T>(cmd: string, args: unknown) =>
    new Promise<T>((resolve) => {
      const id = ++next;
      pending.set(id, resolve as (v: unknown) => void);
      child.send({ id, cmd, args });
    });
  return {
    base: `http://127.0.0.1:${ready.port}`,
    pid: child.pid!,
    scenario: ready.scenario,
    child,
    snapshot: (pagePath) => ask<Snapshot>('snapshot', pagePath),
    memory: () => ask<NodeJS.MemoryUsage>('memory', null),
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

/** One GET with these headers: status, the bytes on the wire, the content-encoding and the time to the last byte. */
export function getOnce(url: string, headers: Record<string, string> = {}): Promise<{ status: number; body: Buffer; encoding: string; ms: number }> {
  const t0 = performance.now();
  return new Promise((resolve, reject) => {
    http
      .get(url, { headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks), encoding: String(res.headers['content-encoding'] ?? 'identity'), ms: performance.now() - t0 }));
      })
      .on('error', reject);
  });
}

async function serve(): Promise<void> {
  const spec = JSON.parse(process.env.BENCH_SCENARIO ?? '{}') as ScenarioSpec;
  const database = process.env.DB_NAME!;
  const { ensureDatabase } = await import('@server/db/cluster');
  await ensureDatabase(undefined, [database]);
  await import('@server/models/index');
  const { sequelize } = await import('@server/db/sequelize');
  const { migrate } = await import('@server/db/migrator');
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public; DROP SCHEMA IF EXISTS pgboss CASCADE;');
  await migrate();

  const { people, seedShow, BENCH_PASSWORD } = await import('./scenario');
  const [organiser] = await people('organiser', 1, { mayOrganise: true });
  const [owner] = await people('owner', 1);
  const [gate] = await people('gate', 1);
  const judges = await people('judge', spec.morning?.judges ?? 0);
  const { createFullBuild, createBuild } = await import('../../support/build-factory');
  const full = await createFullBuild(owner!.id, { title: '1951 Ember fastback, the bench car' });
  const others = await Promise.all([1, 2, 3].map((i) => createBuild(owner!.id, { title: `Bench build ${i}`, published: true })));
  const scenario: Scenario = { organiser: organiser!, judges, gate: gate!, password: BENCH_PASSWORD, sized: {}, buildCodes: [full.code, ...others.map((b) => b.code)] };
  if (spec.morning) {
    scenario.morning = await seedShow({ name: 'Harrowby Brickworks Show Morning', status: 'judging', votingOpen: true, entries: spec.morning.entries, checkedIn: spec.morning.checkedIn, organiser: organiser!, owner: owner!, judges, gate: [gate!], firstBuildId: full.id });
  }
  for (const size of spec.sizes ?? []) {
    scenario.sized[size] = await seedShow({ name: `Brickworks ${size} cars`, status: 'show_day', entries: size, checkedIn: Math.floor(size / 2), organiser: organiser!, owner: owner!, gate: [gate!] });
  }
  await sequelize.query('ANALYZE');

  const { default: express } = await import('express');
  const { default: expressStaticGzip } = await import('express-static-gzip');
  const { createApp } = await import('@server/app');
  const { ChannelListener } = await import('@server/db/channel-listener');
  const { pageChangeHandlers } = await import('@server/pages/page-listener');
  const { publicPageCache } = await import('@server/pages/page-cache');
  const { config } = await import('@server/config');
  const { boundHeapGrowth } = await import('@server/heap-growth');
  boundHeapGrowth(); // as listen() does under npm start
  // As under npm start: this process hears committed changes, so its cached pages are trusted until one arrives.
  await new ChannelListener({ connectionString: config.databaseUrl, ...pageChangeHandlers(publicPageCache) }).start();
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-bench-static-'));
  const outer = express();
  outer.use('/bench-static', expressStaticGzip(dir, { enableBrotli: true, orderPreference: ['br', 'gz'] }));
  outer.use(createApp());
  const server = http.createServer(outer);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  let files = 0;
  const handlers: Record<string, (args: never) => Promise<unknown>> = {
    /** The server's own memory figures (RSS, V8's heap, buffers outside it), for telling what grew. */
    memory: async () => process.memoryUsage(),
    /** The page as a browser gets it, kept as a static file: the plain bytes and the compressed ones the page route sent. */
    snapshot: async (pagePath: string) => {
      const plain = await getOnce(`${base}${pagePath}`, { ...BROWSER_HEADERS, 'accept-encoding': 'identity' });
      const encoded = await getOnce(`${base}${pagePath}`, BROWSER_HEADERS);
      if (plain.status !== 200 || encoded.status !== 200) throw new Error(`${pagePath} answered ${plain.status}/${encoded.status}`);
      const name = `page-${++files}.html`;
      writeFileSync(path.join(dir, name), plain.body);
      const ext = { br: '.br', gzip: '.gz' }[encoded.encoding];
      if (ext) writeFileSync(path.join(dir, name + ext), encoded.body);
      return { staticPath: `/bench-static/${name}`, bytes: plain.body.length, encodedBytes: encoded.body.length, encoding: encoded.encoding } satisfies Snapshot;
    },
  };
  process.on('message', async (m: { id: number; cmd: string; args: never }) => {
    const result = await handlers[m.cmd]!(m.args).catch((err: Error) => ({ error: err.message }));
    process.send!({ id: m.id, result });
  });
  process.send!({ port: (server.address() as AddressInfo).port, scenario });
  const stop = () => {
    server.close();
    server.closeAllConnections();
    rmSync(dir, { recursive: true, force: true });
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('disconnect', stop);
}

if (process.argv.includes('--serve')) await serve();
