import type Stripe from 'stripe';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { AppError } from '../errors';
import { logger } from '../logger';
import { verifyWebhook } from './client';
import { REFERENCE_PATTERN, toCheckout } from './checkout';
import { paymentHandlerFor, type PaymentNotice } from './handlers';

const KINDS: Partial<Record<Stripe.Event.Type, PaymentNotice['kind']>> = {
  'checkout.session.completed': 'paid',
  'checkout.session.async_payment_succeeded': 'paid',
  'checkout.session.async_payment_failed': 'failed',
  'checkout.session.expired': 'expired',
};

export type WebhookResult = { duplicate: boolean; handled: boolean };

/**
 * Verifies a webhook's signature, records its event id and hands it to the handler of its
 * reference, all in one transaction: a replay or a duplicate delivery finds the id recorded and
 * changes nothing; a handler that fails records nothing, so the service's retry runs it again.
 */
export async function processPaymentWebhook(rawBody: Buffer, signature: string | undefined): Promise<WebhookResult> {
  let event: Stripe.Event;
  try {
    event = verifyWebhook(rawBody, signature ?? '');
  } catch {
    throw new AppError(400, 'BAD_REQUEST', 'The webhook signature does not verify.');
  }
  const notice = noticeOf(event);
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

function noticeOf(event: Stripe.Event): PaymentNotice | undefined {
  const kind = KINDS[event.type];
  if (!kind) return undefined;
  const checkout = toCheckout(event.data.object as Stripe.Checkout.Session);
  // A completed session paid by a method that settles later is not paid yet: its async event says when.
  if (event.type === 'checkout.session.completed' && !checkout.paid) return undefined;
  const match = checkout.reference ? REFERENCE_PATTERN.exec(checkout.reference) : null;
  if (!match) return undefined;
  return { kind, reference: checkout.reference!, referenceId: match[2]!, checkout, eventId: event.id };
}
