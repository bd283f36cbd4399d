import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '@server/config';
import { sequelize } from '@server/db/sequelize';
import { apiRateLimitStore } from '@server/middlewares/rate-limits';
import { BatchedRateLimitStore } from '@server/middlewares/rate-limit-batched-store';
import { listenApp } from '../../support/raw-http';
import { addressClient } from '../../support/address-client';
import { createUser } from '../../support/factories';
import { loopbackAddress } from '../../support/visitor';

// The suite lifts the API limit (every supertest request shares 127.0.0.1); this file lowers it for a while
// and talks from loopback addresses of its own, so no other file's requests count here.
const LIMIT = 25;
let server: Awaited<ReturnType<typeof listenApp>>;
let before = config.apiRateLimitPerMinute;
beforeAll(async () => {
  before = config.apiRateLimitPerMinute;
  config.apiRateLimitPerMinute = LIMIT;
  server = await listenApp();
});
afterAll(async () => {
  config.apiRateLimitPerMinute = before;
  await server?.close();
});

/** Counts the statements of the app's Sequelize that touch the API limiter's counters (keys `api:…`) while `work` runs. */
async function limiterStatementsDuring(work: () => Promise<unknown>): Promise<number> {
  let n = 0;
  sequelize.addHook('afterQuery', 'count-limiter', (_options, query) => {
    const sql = String((query as { sql?: unknown }).sql);
    if (sql.includes('rate_limit_hits') && sql.includes("'api:")) n++;
  });
  try {
    await work();
  } finally {
    sequelize.removeHook('afterQuery', 'count-limiter');
  }
  return n;
}

describe('the API limit: per signed-in person, per address for everyone else, with no statement per request', () => {
  it('gives 12 people on one show Wi-Fi each their own budget, still stops an anonymous flood, and counts in memory', async () => {
    const wifi = loopbackAddress();
    // Signing in is anonymous (the address's budget): 12 × 2 requests, under the limit of 25.
    const people = await Promise.all(
      Array.from({ length: 12 }, async () => {
        const { email, password } = await createUser();
        const client = addressClient(server.baseUrl, wifi);
        await client.start();
        expect((await client.signIn(email, password)).status).toBe(200);
        return client;
      }),
    );

    // Signing in left the address one request of its 25. Each person now makes 3 requests and one of them
    // their whole 25: 58 requests from the one address, each within its person's budget.
    const started = Date.now();
    const statements = await limiterStatementsDuring(() =>
      Promise.all(
        people.map(async (p, n) => {
          for (let i = 0; i < (n === 0 ? LIMIT : 3); i++) expect((await p.get('/api/builds')).status).toBe(200);
        }),
      ),
    );
    // No statement per request: at most the merges of the seconds it took (one a second, whatever the requests).
    expect(statements).toBeLessThanOrEqual(Math.ceil((Date.now() - started) / config.rateLimitSyncMs) + 1);
    expect(statements).toBeLessThan(10);
    // The first person's next request is past their own budget; the others still have theirs.
    const over = await people[0]!.get('/api/builds');
    expect(over.status).toBe(429);
    expect(over.body.error?.code).toBe('RATE_LIMITED');
    expect((await people[11]!.get('/api/builds')).status).toBe(200);

    // Anonymous requests from another address share that address's budget: the private API and the public JSON alike.
    const flood = addressClient(server.baseUrl, loopbackAddress());
    const answers: number[] = [];
    for (let i = 0; i < LIMIT; i++) answers.push((await flood.get(i % 2 ? '/api/builds' : '/api/public/events')).status);
    expect(answers.filter((s) => s === 429)).toEqual([]);
    expect((await flood.get('/api/builds')).status).toBe(429);
    expect((await flood.get('/api/public/events')).status).toBe(429);

    // The counters reach PostgreSQL in one statement for all of them, and another process merging its own
    // hits on that address then counts everyone's: 25 answered + 2 refused here, 1 there.
    expect(await limiterStatementsDuring(() => apiRateLimitStore.sync())).toBe(1);
    const elsewhere = new BatchedRateLimitStore('api:');
    elsewhere.init({ windowMs: 60_000 } as Parameters<BatchedRateLimitStore['init']>[0]);
    expect(elsewhere.increment(flood.address).totalHits).toBe(1);
    await elsewhere.sync();
    expect(elsewhere.increment(flood.address).totalHits).toBe(LIMIT + 2 + 2);
    elsewhere.shutdown();
  });
});
