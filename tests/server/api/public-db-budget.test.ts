import { describe, expect, it } from 'vitest';
import type { Request } from 'express';
import pg from 'pg';
import { randomInt } from 'node:crypto';
import { config } from '@server/config';
import { sequelize } from '@server/db/sequelize';
import { cachedPage } from '@server/pages/cached-page';
import { PublicDbBudget, PublicPagesBusyError, publicDbBudget } from '@server/services/platform/public-db-budget';
import { signedIn } from '../../support/event-factory';

describe('the public pages’ share of the database pool', () => {
  it('answers a signed-in request at once while visitors’ pages hold every connection of their share', async () => {
    const judge = await signedIn({ name: 'Judge Early' });
    const key = randomInt(1, 2 ** 31);
    // A connection outside the pool holds a lock that every render below waits for, holding its pooled connection meanwhile.
    const holder = new pg.Client({ connectionString: config.databaseUrl });
    await holder.connect();
    await holder.query('SELECT pg_advisory_lock($1)', [key]);
    let finished = 0;
    // More visitors' renders than the whole pool has connections (the path of every cached public page: /, /c/, /e/).
    const renders = Array.from({ length: config.dbPoolMax + 5 }, (_, i) =>
      cachedPage({} as Request, `held-render|${key}|${i}`, {
        render: async () => {
          await sequelize.query('SELECT pg_advisory_xact_lock(:key)', { replacements: { key } });
          finished++;
          return { html: '<!doctype html><p>held</p>', tags: [] };
        },
      }),
    );
    try {
      await expect.poll(() => publicDbBudget.running).toBe(config.publicDbConnections);
      expect(publicDbBudget.queued).toBe(config.dbPoolMax + 5 - config.publicDbConnections);
      // The judge's request reads the session and the account and answers while every render still waits.
      const answer = await judge.client.get('/api/builds');
      expect(answer.status).toBe(200);
      expect(finished).toBe(0);
    } finally {
      await holder.query('SELECT pg_advisory_unlock($1)', [key]);
      await holder.end();
    }
    // Let go, every visitor's page is rendered, never more than the share at once.
    expect((await Promise.all(renders)).every((p) => p?.identity.toString() === '<!doctype html><p>held</p>')).toBe(true);
    expect(finished).toBe(config.dbPoolMax + 5);
    expect(publicDbBudget.peak).toBeLessThanOrEqual(config.publicDbConnections);
  });

  it('turns visitors away with a 503 past its waiting line, and after waiting as long as for a connection', async () => {
    const budget = new PublicDbBudget(1, 1, 50);
    let release = () => {};
    const running = budget.run(() => new Promise<void>((r) => (release = r)));
    const waiting = budget.run(async () => 'served');
    await expect(budget.run(async () => 'never')).rejects.toBeInstanceOf(PublicPagesBusyError);
    // The one in line gives up after 50 ms (a 503, as for a pool with no free connection)…
    await expect(waiting).rejects.toMatchObject({ status: 503, code: 'UNAVAILABLE' });
    release();
    await running;
    // …and the share serves again.
    expect(await budget.run(async () => 'served')).toBe('served');
  });
});
