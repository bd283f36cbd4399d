import { z } from 'zod';

/** The earliest date a record may carry: older than any dyno or weigh-in anyone will enter (common practice). */
export const EARLIEST_DATE = '1900-01-01';
/** The latest: the end of next year, so a date typed in another time zone or a planned day still fits. */
export const latestDate = (now = new Date()) => `${now.getUTCFullYear() + 1}-12-31`;

/**
 * A real calendar date as `YYYY-MM-DD` (z.iso.date refuses 2023-02-30) between 1900 and the end of
 * next year, so PostgreSQL's `date` never sees year 0000 and a typo like 20266 is a clear 400.
 */
export const calendarDate = (label: string) =>
  z.iso
    .date({ error: `${label}: use a date like 2026-05-30.` })
    .refine((d) => d >= EARLIEST_DATE && d <= latestDate(), { error: `${label} must be between ${EARLIEST_DATE} and ${latestDate()}.` });
