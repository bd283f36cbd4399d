import { z } from 'zod';
import { IdSchema } from './params';

/** A bulk print of numbered cards: queued → running → done (or failed). */
export const CARD_PRINT_STATUSES = ['queued', 'running', 'done', 'failed'] as const;
export type CardPrintStatus = (typeof CARD_PRINT_STATUSES)[number];
export const CARD_PRINT_ACTIVE: readonly CardPrintStatus[] = ['queued', 'running'];

/** Entries that get a numbered card: a paid place (checked in counts, it is still confirmed). */
export const CARD_PRINT_ENTRY_STATUSES = ['confirmed', 'checked_in'] as const;

/** POST /api/events/:id/card-prints: every confirmed entry, or one class. */
export const CardPrintStartSchema = z.object({
  classId: z.number({ error: 'Class must be one of the show’s classes, or left out for every class.' }).int().positive().nullish(),
});
export type CardPrintStartInput = z.infer<typeof CardPrintStartSchema>;

/** GET /api/events/:id/card-prints/latest?classId=: the newest print for that filter. */
export const CardPrintLatestQuerySchema = z.object({ classId: IdSchema.optional() });

export const CardPrintParamsSchema = z.object({ id: IdSchema, printId: IdSchema });

/**
 * A running print whose worker has not beaten for `staleSeconds` (the server's CARD_PRINT_STALE_SECONDS)
 * lost its worker: another worker takes it over, and the organiser may start it again.
 */
export const printStalled = (status: CardPrintStatus, heartbeatAt: Date | null, staleSeconds: number, now = new Date()) =>
  status === 'running' && (!heartbeatAt || now.getTime() - heartbeatAt.getTime() > staleSeconds * 1000);

export type CardPrint = {
  id: number;
  eventId: number;
  classId: number | null;
  className: string | null;
  status: CardPrintStatus;
  done: number;
  total: number;
  /** Cards drawn for this print; the rest came from the cache (same content, same design). */
  rendered: number;
  startedBy: string;
  startedAt: string;
  finishedAt: string | null;
  /** Set when the PDF is ready. */
  downloadUrl: string | null;
  error: string | null;
  /** Running, but its worker stopped: printing again resumes it. */
  stalled: boolean;
};
