import { FakeStore, newId, nowSeconds, type FakeRefund, type FakeSession } from './store';

export type ApiAnswer = { status: number; body: unknown };

/** The service's error shape; the SDK turns it into its typed errors (StripeInvalidRequestError, …). */
export function apiError(status: number, type: string, message: string, extra: { code?: string; param?: string } = {}): ApiAnswer {
  return { status, body: { error: { type, message, ...extra } } };
}

type Form = Record<string, unknown>;
const text = (v: unknown) => (typeof v === 'string' ? v : undefined);
const record = (v: unknown) => (v && typeof v === 'object' && !Array.isArray(v) ? (v as Form) : undefined);
const strings = (v: unknown): Record<string, string> =>
  Object.fromEntries(Object.entries(record(v) ?? {}).filter((e): e is [string, string] => typeof e[1] === 'string'));
const wholeNumber = (v: unknown) => (typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : undefined);

/** POST /v1/checkout/sessions: one line with price_data, in payment mode (what Placard sends). Every value arrives as a string. */
export function createCheckoutSession(store: FakeStore, form: Form, base: string): ApiAnswer {
  if (text(form.mode) !== 'payment') return apiError(400, 'invalid_request_error', 'This stand-in supports mode=payment only.', { param: 'mode' });
  const successUrl = text(form.success_url);
  if (!successUrl || !/^https?:\/\//.test(successUrl)) return apiError(400, 'invalid_request_error', 'Not a valid URL', { param: 'success_url' });
  const items = Array.isArray(form.line_items) ? (form.line_items as unknown[]) : Object.values(record(form.line_items) ?? {});
  const line = record(items[0]);
  const price = record(line?.price_data);
  const currency = text(price?.currency)?.toLowerCase();
  const unitAmount = wholeNumber(price?.unit_amount);
  const quantity = wholeNumber(line?.quantity) ?? 1;
  const name = text(record(price?.product_data)?.name);
  if (items.length !== 1 || !price) return apiError(400, 'invalid_request_error', 'Send exactly one line item with price_data.', { param: 'line_items' });
  if (!currency || !/^[a-z]{3}$/.test(currency)) return apiError(400, 'invalid_request_error', 'Invalid currency.', { param: 'line_items[0][price_data][currency]' });
  if (unitAmount === undefined || unitAmount < 1) {
    return apiError(400, 'invalid_request_error', 'Invalid integer: unit_amount must be a positive whole number of minor units.', { param: 'line_items[0][price_data][unit_amount]' });
  }
  if (!name) return apiError(400, 'invalid_request_error', 'Missing required param: line_items[0][price_data][product_data][name].', { param: 'line_items[0][price_data][product_data][name]' });
  const id = newId('cs');
  const expiresAt = wholeNumber(form.expires_at) ?? nowSeconds() + 24 * 3600;
  const session: FakeSession = {
    id,
    object: 'checkout.session',
    amount_subtotal: unitAmount * quantity,
    amount_total: unitAmount * quantity,
    currency,
    client_reference_id: text(form.client_reference_id) ?? null,
    customer_email: text(form.customer_email) ?? null,
    metadata: strings(form.metadata),
    mode: 'payment',
    payment_intent: null,
    payment_status: 'unpaid',
    status: 'open',
    url: `${base}/pay/${id}`,
    success_url: successUrl,
    cancel_url: text(form.cancel_url) ?? null,
    created: nowSeconds(),
    expires_at: expiresAt,
    livemode: false,
    description: quantity > 1 ? `${name} × ${quantity}` : name,
  };
  store.sessions.set(id, session);
  return { status: 200, body: FakeStore.publicSession(session) };
}

/** POST /v1/refunds: all or part of what a payment intent took, never more than is left. */
export function createRefund(store: FakeStore, form: Form): ApiAnswer {
  const intentId = text(form.payment_intent);
  const intent = intentId ? store.paymentIntents.get(intentId) : undefined;
  if (!intent) return apiError(404, 'invalid_request_error', `No such payment_intent: '${intentId ?? ''}'`, { code: 'resource_missing', param: 'payment_intent' });
  const left = intent.amount - intent.amount_refunded;
  if (left === 0) return apiError(400, 'invalid_request_error', `Charge for ${intent.id} has already been refunded.`, { code: 'charge_already_refunded' });
  const amount = form.amount === undefined ? left : wholeNumber(form.amount);
  if (amount === undefined || amount < 1) return apiError(400, 'invalid_request_error', 'Invalid integer: amount.', { param: 'amount' });
  if (amount > left) {
    return apiError(400, 'invalid_request_error', `Refund amount (${amount}) is greater than unrefunded amount on charge (${left})`, { code: 'amount_too_large', param: 'amount' });
  }
  intent.amount_refunded += amount;
  const refund: FakeRefund = { id: newId('re'), object: 'refund', amount, currency: intent.currency, payment_intent: intent.id, status: 'succeeded', created: nowSeconds(), metadata: strings(form.metadata) };
  store.refunds.set(refund.id, refund);
  return { status: 200, body: refund };
}
