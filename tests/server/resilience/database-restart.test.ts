import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { ErrorResponseSchema } from '@shared/errors';
import { clusterAt } from '@server/db/cluster';
import { forkServer, type ForkedServer } from '../../support/forked-server';

// PostgreSQL goes away under a running server: a planned restart (pg_ctl stop -m fast) and a crash
// (SIGKILL to the postmaster). This file has a throwaway cluster of its own, so the shared test
// database that other files use at the same time is never touched.

const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });

let cluster: ReturnType<typeof clusterAt>;
let server: ForkedServer;
let cookie = '';
let csrf = '';

async function call(method: string, url: string, body?: unknown) {
  const started = Date.now();
  const res = await fetch(server.base + url, {
    method,
    headers: { cookie, 'x-csrf-token': csrf, ...(body === undefined ? {} : { 'content-type': 'application/json' }), 'accept-language': 'en-GB' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  const setCookie = res.headers.get('set-cookie');
  if (setCookie?.startsWith('placard.sid=')) cookie = setCookie.split(';')[0]!;
  return { status: res.status, text, json: () => JSON.parse(text) as unknown, ms: Date.now() - started };
}

async function signIn() {
  csrf = ((await call('GET', '/api/session')).json() as { csrfToken: string }).csrfToken;
  const res = await call('POST', '/api/session', { email: server.email, password: server.password });
  expect(res.status).toBe(200);
  csrf = (res.json() as { csrfToken: string }).csrfToken;
}

/** Whether a process of this pid exists (a zombie counts: PostgreSQL's own check would see it). */
function processExists(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code !== 'ESRCH';
  }
}

const alive = () => server.child.exitCode === null && server.child.signalCode === null;

beforeAll(async () => {
  const dir = path.join(mkdtempSync('/tmp/placard-restart-'), 'postgres');
  cluster = clusterAt(dir, await freePort());
  await cluster.create(['placard_restart']);
  server = await forkServer({ DATABASE_URL: cluster.url('placard_restart'), DB_CONNECT_TIMEOUT_MS: '1000', PAGE_REVALIDATE_MS: '0' });
}, 120_000);

afterAll(async () => {
  await server?.stop();
  cluster?.destroy();
});

/** What a visitor, an owner and a load balancer see while the database is away, then after it returns. */
async function outageAndRecovery(takeDown: () => void, bringBack: () => unknown) {
  try {
    await outageThenRecovery(takeDown, bringBack);
  } catch (err) {
    // What the server said (and, if it died, why) is the first thing to read when this fails.
    throw new Error(`${(err as Error).message}\n--- server output (last 4000 characters) ---\n${server.output().slice(-4000)}`, { cause: err });
  }
}

async function outageThenRecovery(takeDown: () => void, bringBack: () => unknown) {
  await signIn();
  const page = await call('GET', `/c/${server.code}`);
  expect(page.status).toBe(200);
  expect((await call('GET', `/api/builds/${server.buildId}`)).status).toBe(200);
  expect((await call('GET', '/api/health')).status).toBe(200);

  takeDown();

  // The load balancer is told, the process stays up.
  // How soon the server notices depends on when its pooled connections see the backends die: patient here,
  // strict below (each request, once it is known down, answers within a second).
  await vi.waitFor(async () => expect((await call('GET', '/api/health')).status).toBe(503), { timeout: 15_000, interval: 100 });
  expect(alive()).toBe(true);
  // Each API request fails fast, in the one error shape, as 503 (never a 500, never a hang).
  for (const [method, url, body] of [
    ['GET', `/api/builds/${server.buildId}`],
    ['GET', '/api/session'],
    ['PUT', `/api/builds/${server.buildId}/sections/body`, { paint: 'Oxblood over cream' }],
  ] as const) {
    const res = await call(method, url, body);
    expect(res.status, `${method} ${url}`).toBe(503);
    expect(ErrorResponseSchema.parse(res.json()).error.code).toBe('UNAVAILABLE');
    expect(res.ms, `${method} ${url} answered in ${res.ms} ms`).toBeLessThan(1000);
  }
  // A visitor who scans the card still reads the page (from the cache; this server revalidates on every request).
  for (let i = 0; i < 3; i++) {
    const cached = await call('GET', `/c/${server.code}`);
    expect(cached.status).toBe(200);
    expect(cached.text).toBe(page.text);
  }
  expect(alive()).toBe(true);

  await bringBack();

  // Full recovery with no restart of the server: health, the same session, a write, the page.
  await vi.waitFor(async () => expect((await call('GET', '/api/health')).status).toBe(200), { timeout: 30_000, interval: 200 });
  expect((await call('GET', `/api/builds/${server.buildId}`)).status).toBe(200);
  const saved = await call('PUT', `/api/builds/${server.buildId}/sections/body`, { paint: `Oxblood, coat ${Date.now()}` });
  expect(saved.status).toBe(200);
  expect((await call('GET', `/c/${server.code}`)).status).toBe(200);
  expect(alive()).toBe(true);
}

describe('the server when PostgreSQL goes away and comes back', () => {
  it('survives a restart (pg_ctl stop -m fast, then start)', async () => {
    await outageAndRecovery(
      () => cluster.stop(),
      () => cluster.start(),
    );
    // The outage was logged (not silent), and nothing crashed the process.
    expect(server.output()).toMatch(/database unavailable/);
  });

  it('survives a killed postmaster (SIGKILL), recovering when PostgreSQL is started again', async () => {
    let killed = 0;
    await outageAndRecovery(
      () => void (killed = cluster.killPostmaster()),
      async () => {
        // Until the killed process is reaped, its pid in postmaster.pid still answers kill(pid, 0), and
        // PostgreSQL (and pg_ctl) take the old cluster for a running one: wait for it to be gone.
        await vi.waitFor(() => expect(processExists(killed)).toBe(false), { timeout: 30_000, interval: 100 });
        // Orphaned backends can hold the shared memory for a moment after the kill: start when it is free.
        await vi.waitFor(() => cluster.start(), { timeout: 30_000, interval: 250 });
        expect(cluster.isRunning()).toBe(true);
      },
    );
  });
});
