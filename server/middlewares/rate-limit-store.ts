import type { Store, Options, IncrementResponse } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * express-rate-limit counters kept in PostgreSQL, so every server process behind a load
 * balancer counts the same hits. One row per key; a window restarts when its reset time passes.
 */
export class PostgresRateLimitStore implements Store {
  windowMs = 60_000;
  constructor(readonly prefix: string) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const rows = await sequelize.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, 1, now() + make_interval(secs => :secs))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.prefix + key, secs: this.windowMs / 1000 }, type: QueryTypes.SELECT },
    );
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: new Date(row.reset_at) };
  }

  async decrement(key: string): Promise<void> {
    await sequelize.query('UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = :key', { replacements: { key: this.prefix + key } });
  }

  async resetKey(key: string): Promise<void> {
    await sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', { replacements: { key: this.prefix + key } });
  }
}
