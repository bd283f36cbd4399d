import { z } from 'zod';

/** Mail caught by the local SMTP catcher in demo mode (never in production). */
export const CaughtMailSummarySchema = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  receivedAt: z.string(),
});
export const CaughtMailSchema = CaughtMailSummarySchema.extend({ from: z.string(), text: z.string(), html: z.string().nullable() });
export type CaughtMailSummary = z.infer<typeof CaughtMailSummarySchema>;
export type CaughtMail = z.infer<typeof CaughtMailSchema>;
export const CaughtMailListResponseSchema = z.object({ mail: z.array(CaughtMailSummarySchema) });
export type CaughtMailListResponse = z.infer<typeof CaughtMailListResponseSchema>;

/** Mail the queue could not hand to the mail server: still being retried, or given up after every retry. */
export const UndeliveredMailSchema = z.object({
  id: z.string(),
  to: z.string(),
  subject: z.string(),
  status: z.enum(['retrying', 'gave_up']),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  queuedAt: z.string(),
});
export type UndeliveredMail = z.infer<typeof UndeliveredMailSchema>;
