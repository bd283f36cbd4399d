import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { config } from '../../config';
import { AppError, ValidationError } from '../../errors';

/**
 * Image work is the costliest thing a person can ask of the server (a 100-megapixel photo is seconds
 * of CPU), so it is bounded three ways: the pixels of one request, the pixels of one person per
 * window (counted in PostgreSQL, shared by every server process), and how many images one process
 * decodes at once. Until a job queue takes resizing off the request path, the last one is what keeps
 * a core free for visitors while owners upload.
 */

/** Runs at most `size` tasks at a time; the rest wait their turn in order. */
export class Slots {
  private active = 0;
  private waiting: (() => void)[] = [];
  /** The most tasks ever seen running at once (tests read it). */
  peak = 0;

  constructor(public size: number) {}

  async run<T>(task: () => Promise<T>): Promise<T> {
    if (this.active >= this.size) await new Promise<void>((resolve) => this.waiting.push(resolve));
    else this.active++;
    this.peak = Math.max(this.peak, this.active);
    try {
      return await task();
    } finally {
      const next = this.waiting.shift();
      if (next) next(); // the slot passes straight to the next in line
      else this.active--;
    }
  }
}

export const imageSlots = new Slots(config.imageConcurrency);

const megapixels = (pixels: number) => Math.round(pixels / 100_000) / 10;

/** All the files of one upload together stay under the per-request budget. */
export function checkRequestPixels(pixels: number): void {
  const limit = config.photoRequestMegapixels;
  if (pixels > limit * 1_000_000) {
    throw new ValidationError(
      { photos: `These photos hold ${megapixels(pixels)} megapixels together; one upload may hold at most ${limit}. Send fewer or smaller photos at a time.` },
      'The upload is too large to process, so nothing was saved.',
    );
  }
}

/**
 * Spends `pixels` of the person's budget for the current window, or refuses with 429 when it would
 * pass the budget (a refused upload spends nothing). Counted in kilopixels in `rate_limit_hits`.
 */
export async function chargePersonPixels(userId: number, pixels: number): Promise<void> {
  const key = `photo-pixels:user:${userId}`;
  const cost = Math.ceil(pixels / 1000);
  const budget = config.photoMegapixelsPerWindow * 1000;
  const secs = config.photoPixelWindowMs / 1000;
  // Start a fresh window when the old one is over, then add the cost only if it fits.
  await sequelize.query(
    `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, 0, now() + make_interval(secs => :secs))
     ON CONFLICT (key) DO UPDATE SET
       hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 0 ELSE rate_limit_hits.hits END,
       reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END`,
    { replacements: { key, secs } },
  );
  const charged = await sequelize.query(`UPDATE rate_limit_hits SET hits = hits + :cost WHERE key = :key AND hits + :cost <= :budget RETURNING hits`, {
    replacements: { key, cost, budget },
    type: QueryTypes.SELECT,
  });
  if (charged.length === 0) {
    throw new AppError(429, 'RATE_LIMITED', `You have sent more than ${config.photoMegapixelsPerWindow} megapixels of photos in the last ${Math.round(secs / 60)} minutes. Wait a few minutes and try again.`);
  }
}
