import type Stripe from 'stripe';
import { QueryTypes } from 'sequelize';
import { fieldsFromIssues } from '@shared/errors';
import { config } from '../config';
import { sequelize } from '../db/sequelize';
import { AppError, NotFoundError } from '../errors';
import { logger } from '../logger';
import { verifyWebhook } from './client';
import { REFERENCE_PATTERN, toCheckout } from './checkout';
import { paymentHandlerFor, type PaymentNotice } from './handlers';
import { WebhookEventSchema, WebhookSessionSchema } from './webhook-event';

const KINDS: Partial<Record<string, PaymentNotice['kind']>> = {
  'checkout.session.completed': 'paid',
  'checkout.session.async_payment_succeeded': 'paid',
  'checkout.session.async_payment_failed': 'failed',
  'checkout.session.expired': 'expired',
};

export type WebhookResult = { duplicate: boolean; handled: boolean };

/**
 * Verifies a webhook's signature, checks its shape, records its event id and hands it to the handler
 * of its reference, all in one transaction: a replay or a duplicate delivery finds the id recorded and
 * changes nothing; a handler that fails records nothing, so the service's retry runs it again.
 */
export async function processPaymentWebhook(rawBody: Buffer, signature: string | undefined): Promise<WebhookResult> {
  if (config.payments.mode === 'off') throw new NotFoundError('Online payment is switched off.');
  let verified: Stripe.Event;
  try {
    verified = verifyWebhook(rawBody, signature ?? '');
  } catch {
    throw new AppError(400, 'BAD_REQUEST', 'The webhook signature does not verify.');
  }
  const { event, notice } = readEvent(verified);
  return sequelize.transaction(async (transaction) => {
    const fresh = await sequelize.query(
      'INSERT INTO payment_events (id, type, reference, created_at) VALUES ($1, $2, $3, now()) ON CONFLICT (id) DO NOTHING RETURNING id',
      { bind: [event.id, event.type, notice?.reference ?? null], transaction, type: QueryTypes.SELECT },
    );
    if (fresh.length === 0) return { duplicate: true, handled: false };
    if (!notice) return { duplicate: false, handled: false };
    const handler = paymentHandlerFor(notice.reference.split(':')[0]!);
    if (!handler) {
      logger.warn({ eventId: event.id, reference: notice.reference }, 'payment webhook for a reference no handler claims');
      return { duplicate: false, handled: false };
    }
    await handler(notice, transaction);
    return { duplicate: false, handled: true };
  });
}

/** A 400 that names the fields, logged: the sender is the service itself, so an odd shape is worth a look. */
function malformed(verified: Stripe.Event, issues: Parameters<typeof fieldsFromIssues>[0], prefix: string): never {
  const fields = Object.fromEntries(Object.entries(fieldsFromIssues(issues)).map(([k, v]) => [`${prefix}${k}`, v]));
  const id = typeof verified.id === 'string' ? verified.id.slice(0, 80) : null;
  logger.warn({ eventId: id, type: String(verified.type).slice(0, 100), fields }, 'payment webhook of a shape Placard does not read: refused');
  throw new AppError(400, 'BAD_REQUEST', 'The webhook event is not of a shape Placard reads.', fields);
}

function readEvent(verified: Stripe.Event): { event: { id: string; type: string }; notice: PaymentNotice | undefined } {
  const parsed = WebhookEventSchema.safeParse(verified);
  if (!parsed.success) malformed(verified, parsed.error.issues, '');
  const event = parsed.data;
  const kind = KINDS[event.type];
  if (!kind) return { event, notice: undefined };
  const session = WebhookSessionSchema.safeParse(event.data.object);
  if (!session.success) malformed(verified, session.error.issues, 'data.object.');
  const checkout = toCheckout(session.data);
  // A completed session paid by a method that settles later is not paid yet: its async event says when.
  if (event.type === 'checkout.session.completed' && !checkout.paid) return { event, notice: undefined };
  const match = checkout.reference ? REFERENCE_PATTERN.exec(checkout.reference) : null;
  if (!match) return { event, notice: undefined };
  return { event, notice: { kind, reference: checkout.reference!, referenceId: match[2]!, checkout, eventId: event.id } };
}
