import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { config } from '../config';
import { logger } from '../logger';

/** One key's count in this process: the total all processes had at the last merge, and our hits since. */
type Counter = { resetAt: number; shared: number; pending: number };

/**
 * express-rate-limit counters kept in this process and merged into PostgreSQL in one statement every
 * `RATE_LIMIT_SYNC_MS` (1 s), so a request costs no database round trip while every process still sees
 * the others' hits. Each key's window starts at its first hit, as in PostgresRateLimitStore; a merge adds
 * this process's hits to the shared row and takes back the shared total and window.
 *
 * The trade-off: between two merges a process knows only its own new hits, so with N processes a key may
 * pass its limit by up to what the other N − 1 processes let through in one sync interval (at 600 a minute,
 * 10 a second: a few requests). With one process the count is exact. If the database is away, counting
 * goes on here and the hits are merged when it is back.
 */
export class BatchedRateLimitStore implements Store {
  windowMs = 60_000;
  private counters = new Map<string, Counter>();
  private timer: NodeJS.Timeout | undefined;
  private syncing: Promise<void> | undefined;

  constructor(
    readonly prefix: string,
    private syncMs = config.rateLimitSyncMs,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private counter(key: string, now = Date.now()): Counter {
    let c = this.counters.get(key);
    if (!c || c.resetAt <= now) {
      // A new window here; the merge adopts the shared row's window if another process opened one first.
      c = { resetAt: now + this.windowMs, shared: 0, pending: 0 };
      this.counters.set(key, c);
    }
    return c;
  }

  increment(key: string): IncrementResponse {
    const c = this.counter(key);
    c.pending++;
    this.startTimer();
    return { totalHits: c.shared + c.pending, resetTime: new Date(c.resetAt) };
  }

  decrement(key: string): void {
    const c = this.counters.get(key);
    if (c) c.pending--;
  }

  resetKey(key: string): void {
    this.counters.set(key, { resetAt: Date.now() + this.windowMs, shared: 0, pending: 0 });
    void sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', { replacements: { key: this.prefix + key } }).catch((err: unknown) => logger.warn({ err }, 'rate limit reset not stored'));
  }

  private startTimer(): void {
    if (this.timer) return;
    this.timer = setInterval(() => void this.sync(), this.syncMs);
    this.timer.unref(); // counting never keeps a process alive
  }

  /**
   * Merges every key with hits since the last merge into PostgreSQL in one statement, and takes back each
   * key's shared total and window. Expired keys with nothing to send are forgotten.
   */
  sync(): Promise<void> {
    this.syncing ??= this.merge().finally(() => (this.syncing = undefined));
    return this.syncing;
  }

  private async merge(): Promise<void> {
    const now = Date.now();
    const batch = [...this.counters].filter(([key, c]) => {
      if (c.pending !== 0) return true;
      if (c.resetAt <= now) this.counters.delete(key);
      return false;
    });
    if (!batch.length) return;
    const sent = batch.map(([, c]) => c.pending);
    try {
      const rows = await sequelize.query<{ key: string; hits: number; reset_at: Date }>(
        `INSERT INTO rate_limit_hits (key, hits, reset_at)
           SELECT k, greatest(d, 0), r FROM unnest(ARRAY[:keys]::text[], ARRAY[:deltas]::int[], ARRAY[:resets]::timestamptz[]) AS x(k, d, r)
         ON CONFLICT (key) DO UPDATE SET
           hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.hits ELSE greatest(rate_limit_hits.hits + EXCLUDED.hits, 0) END,
           reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
         RETURNING key, hits, reset_at`,
        {
          replacements: { keys: batch.map(([key]) => this.prefix + key), deltas: sent, resets: batch.map(([, c]) => new Date(c.resetAt)) },
          type: QueryTypes.SELECT,
        },
      );
      const byKey = new Map(rows.map((r) => [r.key, r]));
      batch.forEach(([key, c], i) => {
        const row = byKey.get(this.prefix + key);
        if (!row || this.counters.get(key) !== c) return; // the window rolled over meanwhile
        c.pending -= sent[i]!;
        c.shared = row.hits;
        c.resetAt = new Date(row.reset_at).getTime();
      });
    } catch (err) {
      // Kept for the next merge: the limit still holds on this process's own count.
      logger.warn({ err }, 'rate limit counters not merged into the database; kept for the next try');
    }
  }

  shutdown(): void {
    clearInterval(this.timer);
    this.timer = undefined;
  }
}
