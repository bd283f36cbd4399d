import { z } from 'zod';

/**
 * The parts of a payment webhook Placard reads, checked after the signature: a signed event of an
 * odd shape is still refused with a 400 naming the field (and logged), never a 500 retried for days.
 */
export const WebhookEventSchema = z.object({
  id: z.string().min(1).max(255).regex(/^[A-Za-z0-9_-]+$/, { error: 'An event id is letters, digits, hyphens and underscores.' }),
  type: z.string().min(1).max(100),
  data: z.object({ object: z.record(z.string(), z.unknown()) }),
});

/** A Checkout Session as the checkout.session.* events carry it. */
export const WebhookSessionSchema = z.object({
  id: z.string().min(1).max(255),
  status: z.enum(['open', 'complete', 'expired']).nullable(),
  payment_status: z.enum(['paid', 'unpaid', 'no_payment_required']),
  amount_total: z.number().int().min(0).max(Number.MAX_SAFE_INTEGER).nullable(),
  currency: z.string().regex(/^[A-Za-z]{3}$/, { error: 'A currency is a three-letter ISO 4217 code.' }).nullable(),
  client_reference_id: z.string().max(200).nullable().optional(),
  metadata: z.record(z.string(), z.string()).nullable().optional(),
  payment_intent: z.union([z.string().max(255), z.object({ id: z.string().max(255) })]).nullable().optional(),
  url: z.string().max(2000).nullable().optional(),
});
export type WebhookSession = z.infer<typeof WebhookSessionSchema>;
