import Stripe from 'stripe';
import { UnavailableError } from '../errors';
import { paymentsClient } from './client';

/** What the entrant reads when the payment service is down or hangs: nothing was changed, and what to do. */
export const PAYMENTS_UNAVAILABLE_MESSAGE = 'Payments are not answering right now. Your entry is kept as it was; try Pay again in a few minutes.';

/** The payment service could not be reached, timed out or failed on its side: a 503 the entrant can act on. */
export class PaymentsUnavailableError extends UnavailableError {
  constructor() {
    super(PAYMENTS_UNAVAILABLE_MESSAGE);
  }
}

/** Runs one SDK call (with its own bounded wait and retries); a service that is down or hangs becomes PaymentsUnavailableError. */
async function call<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (err) {
    const down = err instanceof Stripe.errors.StripeConnectionError || err instanceof Stripe.errors.StripeAPIError || err instanceof Stripe.errors.StripeRateLimitError;
    if (down) throw new PaymentsUnavailableError();
    throw err;
  }
}

/** A reference names what is paid for as `<kind>:<id>` (e.g. `entry:42`); the kind picks the webhook handler. */
export const REFERENCE_PATTERN = /^([a-z][a-z0-9-]{0,30}):([A-Za-z0-9_-]{1,80})$/;

export type CheckoutRequest = {
  /** Integer minor units of `currency` (cents for USD, yen for JPY). */
  amountMinor: number;
  /** ISO 4217 code, e.g. 'USD'. */
  currency: string;
  /** The line the payer sees, e.g. "Entry 14 — Spring Gathering". */
  description: string;
  reference: string;
  /** Same key, same session: a double click never opens two. */
  idempotencyKey: string;
  successUrl: string;
  cancelUrl: string;
  customerEmail?: string;
};

export type Checkout = {
  id: string;
  /** Where the payer goes; null once the session is complete or expired. */
  url: string | null;
  status: 'open' | 'complete' | 'expired';
  paid: boolean;
  amountMinor: number;
  currency: string;
  reference: string | null;
  paymentIntentId: string | null;
};

export function assertMoney(amountMinor: number, currency: string): void {
  if (!Number.isSafeInteger(amountMinor) || amountMinor < 1) throw new RangeError(`amountMinor must be a positive whole number of minor units, not ${amountMinor}`);
  if (!/^[A-Z]{3}$/.test(currency) || !Intl.supportedValuesOf('currency').includes(currency)) throw new RangeError(`currency must be an ISO 4217 code, not ${currency}`);
}

const idOf = (v: string | { id: string } | null | undefined) => (v == null ? null : typeof v === 'string' ? v : v.id);

/** What toCheckout reads: a session from the SDK, or one a webhook carried (parsed by WebhookSessionSchema). */
type SessionFields = Pick<Stripe.Checkout.Session, 'id' | 'payment_status' | 'amount_total' | 'currency'> & {
  status: string | null;
  url?: string | null;
  client_reference_id?: string | null;
  metadata?: Record<string, string> | null;
  payment_intent?: string | { id: string } | null;
};

export function toCheckout(session: SessionFields): Checkout {
  return {
    id: session.id,
    url: session.url ?? null,
    status: session.status === 'complete' ? 'complete' : session.status === 'expired' ? 'expired' : 'open',
    paid: session.payment_status === 'paid' || session.payment_status === 'no_payment_required',
    amountMinor: session.amount_total ?? 0,
    currency: (session.currency ?? '').toUpperCase(),
    reference: session.client_reference_id ?? session.metadata?.reference ?? null,
    paymentIntentId: idOf(session.payment_intent),
  };
}

/** Opens a hosted checkout for one amount; the webhook says when it is paid or expired. */
export async function createCheckout(req: CheckoutRequest): Promise<Checkout> {
  assertMoney(req.amountMinor, req.currency);
  if (!REFERENCE_PATTERN.test(req.reference)) throw new RangeError(`reference must look like kind:id, not ${req.reference}`);
  const session = await call(() => paymentsClient().checkout.sessions.create(
    {
      mode: 'payment',
      line_items: [{ quantity: 1, price_data: { currency: req.currency.toLowerCase(), unit_amount: req.amountMinor, product_data: { name: req.description } } }],
      client_reference_id: req.reference,
      metadata: { reference: req.reference },
      payment_intent_data: { metadata: { reference: req.reference } },
      success_url: req.successUrl,
      cancel_url: req.cancelUrl,
      ...(req.customerEmail ? { customer_email: req.customerEmail } : {}),
    },
    { idempotencyKey: req.idempotencyKey },
  ));
  return toCheckout(session);
}

export async function retrieveCheckout(id: string): Promise<Checkout> {
  return toCheckout(await call(() => paymentsClient().checkout.sessions.retrieve(id)));
}

/**
 * Closes an open checkout so it can no longer be paid (the fee was taken another way). Answers false
 * when it was not open any more (paid, expired or unknown to the service).
 */
export async function expireCheckout(id: string): Promise<boolean> {
  try {
    await call(() => paymentsClient().checkout.sessions.expire(id));
    return true;
  } catch (err) {
    if (err instanceof Stripe.errors.StripeInvalidRequestError) return false;
    throw err;
  }
}

export type RefundRequest = ({ paymentIntentId: string } | { checkoutId: string }) & { amountMinor: number; idempotencyKey: string };
export type Refund = { id: string; amountMinor: number; currency: string; status: string; paymentIntentId: string };

/** Gives back all or part of a payment; the same key never refunds twice. */
export async function refund(req: RefundRequest): Promise<Refund> {
  if (!Number.isSafeInteger(req.amountMinor) || req.amountMinor < 1) throw new RangeError(`amountMinor must be a positive whole number, not ${req.amountMinor}`);
  const paymentIntentId = 'paymentIntentId' in req ? req.paymentIntentId : (await retrieveCheckout(req.checkoutId)).paymentIntentId;
  if (!paymentIntentId) throw new RangeError('This checkout was never paid: there is nothing to refund.');
  const made = await call(() => paymentsClient().refunds.create({ payment_intent: paymentIntentId, amount: req.amountMinor }, { idempotencyKey: req.idempotencyKey }));
  return { id: made.id, amountMinor: made.amount, currency: made.currency.toUpperCase(), status: made.status ?? 'pending', paymentIntentId };
}
