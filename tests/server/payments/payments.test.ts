import { describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import Stripe from 'stripe';
import { QueryTypes } from 'sequelize';
import { randomUUID } from 'node:crypto';
import { sequelize } from '@server/db/sequelize';
import { createCheckout, refund, retrieveCheckout } from '@server/payments/checkout';
import { paymentsClient } from '@server/payments/client';
import { registerPaymentHandler, type PaymentNotice } from '@server/payments/handlers';
import { signPayload } from '@server/payments/fake/webhooks';
import { config } from '@server/config';
import { ErrorResponseSchema } from '@shared/errors';
import { testApp } from '../../support/api-client';
import { useFakePayments } from '../../support/payments';

const FAKE_WEBHOOK_SECRET = config.payments.webhookSecret; // random per start of the process

const env = useFakePayments();

// The test's own kind of reference and handler, as the entries of a show will register theirs.
const notices: PaymentNotice[] = [];
let failNext = 0;
registerPaymentHandler('testpay', async (notice, transaction) => {
  // Inside the webhook's transaction: a handler's write commits with the event id, or neither does.
  await sequelize.query('SELECT 1', { transaction });
  if (failNext > 0) {
    failNext--;
    throw new Error('the handler failed this time');
  }
  notices.push(notice);
});
const noticesFor = (reference: string) => notices.filter((n) => n.reference === reference);

const recordedEvents = async (id: string) =>
  (await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM payment_events WHERE id = $1', { bind: [id], type: QueryTypes.SELECT }))[0]!.n;

function checkoutFor(reference: string, overrides: Partial<Parameters<typeof createCheckout>[0]> = {}) {
  return createCheckout({
    amountMinor: 2500,
    currency: 'USD',
    description: 'Entry 14 — Harbour Lights Motor Meet',
    reference,
    idempotencyKey: `${reference}:attempt-1`,
    successUrl: `${env.baseUrl}/entries/paid?session={CHECKOUT_SESSION_ID}`,
    cancelUrl: `${env.baseUrl}/entries/unpaid`,
    customerEmail: 'payer@example.test',
    ...overrides,
  });
}

/** What the payer does on the checkout page: press a button (a form POST), then follow the redirect. */
async function press(checkoutUrl: string, button: 'pay' | 'cancel') {
  const res = await fetch(`${checkoutUrl}/${button}`, { method: 'POST', redirect: 'manual' });
  return { status: res.status, location: res.headers.get('location') };
}

const newReference = () => `testpay:${randomUUID().slice(0, 8)}`;

describe('payments through the SDK against the local fake', () => {
  it('opens one session for one idempotency key, however often it is asked', async () => {
    const reference = newReference();
    const first = await checkoutFor(reference);
    const again = await checkoutFor(reference);
    expect(again.id).toBe(first.id);
    expect(first).toMatchObject({ status: 'open', paid: false, amountMinor: 2500, currency: 'USD', reference, paymentIntentId: null });
    expect(first.url).toBe(`${env.fake.url}/pay/${first.id}`);
    expect([...env.fake.store.sessions.values()].filter((s) => s.client_reference_id === reference)).toHaveLength(1);
    // The same key for a different amount is a bug in the caller, refused as the service refuses it.
    await expect(checkoutFor(reference, { amountMinor: 3000 })).rejects.toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    const other = await checkoutFor(reference, { idempotencyKey: `${reference}:attempt-2` });
    expect(other.id).not.toBe(first.id);
  });

  it('shows a plain pay page, and paying posts a signed webhook that reaches the handler once', async () => {
    const reference = newReference();
    const checkout = await checkoutFor(reference);
    const page = await fetch(checkout.url!);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('Entry 14 — Harbour Lights Motor Meet');
    expect(html).toContain('Pay $25.00');
    expect(html).toContain('no money moves');

    const paid = await press(checkout.url!, 'pay');
    expect(paid.status).toBe(303);
    expect(paid.location).toBe(`${env.baseUrl}/entries/paid?session=${checkout.id}`);

    await vi.waitFor(() => expect(noticesFor(reference)).toHaveLength(1), { timeout: 10_000 });
    const [notice] = noticesFor(reference);
    expect(notice).toMatchObject({ kind: 'paid', reference, referenceId: reference.split(':')[1] });
    expect(notice!.checkout).toMatchObject({ id: checkout.id, status: 'complete', paid: true, amountMinor: 2500, currency: 'USD' });
    expect(notice!.checkout.paymentIntentId).toMatch(/^pi_/);
    expect(await recordedEvents(notice!.eventId)).toBe(1);
    expect(await retrieveCheckout(checkout.id)).toMatchObject({ status: 'complete', paid: true, url: null });
    // The page cannot be paid twice.
    expect((await press(checkout.url!, 'pay')).status).toBe(409);
  });

  it('changes nothing when a webhook is replayed or delivered twice', async () => {
    const reference = newReference();
    const checkout = await checkoutFor(reference);
    await press(checkout.url!, 'pay');
    await vi.waitFor(() => expect(noticesFor(reference)).toHaveLength(1), { timeout: 10_000 });
    const delivery = await vi.waitFor(() => {
      const found = env.fake.webhooks.deliveries.find((d) => d.type === 'checkout.session.completed' && d.payload.includes(checkout.id) && d.status === 200);
      expect(found).toBeDefined();
      return found!;
    });
    for (let i = 0; i < 2; i++) {
      const replay = await request(testApp()).post('/api/payments/webhook').set('Content-Type', 'application/json').set('Stripe-Signature', delivery.signature).send(delivery.payload);
      expect(replay.status).toBe(200);
      expect(replay.body).toEqual({ received: true, duplicate: true });
    }
    expect(noticesFor(reference)).toHaveLength(1);
    expect(await recordedEvents(delivery.eventId)).toBe(1);
  });

  it('refuses a forged webhook with a 400 and records nothing', async () => {
    const reference = newReference();
    const checkout = await checkoutFor(reference);
    const forgedEvent = JSON.stringify({
      id: `evt_forged_${randomUUID()}`,
      object: 'event',
      type: 'checkout.session.completed',
      data: { object: { id: checkout.id, object: 'checkout.session', status: 'complete', payment_status: 'paid', client_reference_id: reference, amount_total: 2500, currency: 'usd' } },
    });
    const real = signPayload(forgedEvent, FAKE_WEBHOOK_SECRET);
    const attempts = [
      { signature: signPayload(forgedEvent, 'whsec_someone_elses_secret'), body: forgedEvent }, // wrong secret
      { signature: real, body: forgedEvent.replace('2500', '1') }, // body changed after signing
      { signature: real.replace(/t=\d+/, 't=1000000000'), body: forgedEvent }, // timestamp changed
      { signature: signPayload(forgedEvent, FAKE_WEBHOOK_SECRET, Math.floor(Date.now() / 1000) - 3600), body: forgedEvent }, // an old capture
      { signature: undefined, body: forgedEvent }, // no signature
    ];
    for (const { signature, body } of attempts) {
      let req = request(testApp()).post('/api/payments/webhook').set('Content-Type', 'application/json');
      if (signature) req = req.set('Stripe-Signature', signature);
      const res = await req.send(body);
      expect(res.status).toBe(400);
      expect(ErrorResponseSchema.parse(res.body).error.message).toBe('The webhook signature does not verify.');
    }
    expect(noticesFor(reference)).toHaveLength(0);
    expect(await recordedEvents(JSON.parse(forgedEvent).id)).toBe(0);
    // The same event signed with the real secret goes through: the checks above failed for their reason only.
    const genuine = await request(testApp()).post('/api/payments/webhook').set('Content-Type', 'application/json').set('Stripe-Signature', real).send(forgedEvent);
    expect(genuine.status).toBe(200);
  });

  it('signs exactly as the SDK’s own test helper does', () => {
    const payload = JSON.stringify({ id: 'evt_1', object: 'event' });
    const timestamp = 1_790_000_000;
    expect(signPayload(payload, FAKE_WEBHOOK_SECRET, timestamp)).toBe(Stripe.webhooks.generateTestHeaderString({ payload, secret: FAKE_WEBHOOK_SECRET, timestamp }));
  });

  it('leaves an abandoned checkout open to pay again, and an expired one lets a new one be paid', async () => {
    const reference = newReference();
    const checkout = await checkoutFor(reference);
    const cancelled = await press(checkout.url!, 'cancel');
    expect(cancelled).toEqual({ status: 303, location: `${env.baseUrl}/entries/unpaid` });
    expect((await retrieveCheckout(checkout.id)).status).toBe('open');
    expect(noticesFor(reference)).toHaveLength(0);

    // "Pay now" again: the same key gives the same open session, which now gets paid.
    const again = await checkoutFor(reference);
    expect(again.id).toBe(checkout.id);
    await press(again.url!, 'pay');
    await vi.waitFor(() => expect(noticesFor(reference).map((n) => n.kind)).toEqual(['paid']), { timeout: 10_000 });

    // A session that expires tells its handler so, and the next attempt opens a fresh one.
    const late = newReference();
    const stale = await checkoutFor(late);
    await paymentsClient().checkout.sessions.expire(stale.id);
    await vi.waitFor(() => expect(noticesFor(late).map((n) => n.kind)).toEqual(['expired']), { timeout: 10_000 });
    expect(await retrieveCheckout(stale.id)).toMatchObject({ status: 'expired', url: null });
    const fresh = await checkoutFor(late, { idempotencyKey: `${late}:attempt-2` });
    expect(fresh.id).not.toBe(stale.id);
    await press(fresh.url!, 'pay');
    await vi.waitFor(() => expect(noticesFor(late).map((n) => n.kind)).toEqual(['expired', 'paid']), { timeout: 10_000 });
  });

  it('retries a webhook whose handler failed, and applies it once', async () => {
    const reference = newReference();
    const checkout = await checkoutFor(reference);
    failNext = 1;
    await press(checkout.url!, 'pay');
    await vi.waitFor(() => expect(noticesFor(reference)).toHaveLength(1), { timeout: 15_000 });
    const attemptsOf = () => env.fake.webhooks.deliveries.filter((d) => d.payload.includes(checkout.id) && d.type === 'checkout.session.completed');
    await vi.waitFor(() => expect(attemptsOf().map((a) => a.status)).toEqual([500, 200]));
    const attempts = attemptsOf();
    expect(await recordedEvents(attempts[0]!.eventId)).toBe(1);
  });

  it('refunds part and then the rest, never twice for one key and never more than was paid', async () => {
    const reference = newReference();
    const checkout = await checkoutFor(reference);
    await press(checkout.url!, 'pay');
    await vi.waitFor(() => expect(noticesFor(reference)).toHaveLength(1), { timeout: 10_000 });
    const paymentIntentId = noticesFor(reference)[0]!.checkout.paymentIntentId!;

    const part = await refund({ paymentIntentId, amountMinor: 1000, idempotencyKey: `${reference}:refund-1` });
    expect(part).toMatchObject({ amountMinor: 1000, currency: 'USD', status: 'succeeded', paymentIntentId });
    const sameKey = await refund({ paymentIntentId, amountMinor: 1000, idempotencyKey: `${reference}:refund-1` });
    expect(sameKey.id).toBe(part.id);
    await expect(refund({ paymentIntentId, amountMinor: 1600, idempotencyKey: `${reference}:refund-2` })).rejects.toMatchObject({ code: 'amount_too_large' });
    const rest = await refund({ checkoutId: checkout.id, amountMinor: 1500, idempotencyKey: `${reference}:refund-3` });
    expect(rest.amountMinor).toBe(1500);
    expect(env.fake.store.paymentIntents.get(paymentIntentId)!.amount_refunded).toBe(2500);
    await expect(refund({ paymentIntentId, amountMinor: 1, idempotencyKey: `${reference}:refund-4` })).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  it('refuses money that is not whole minor units of an ISO 4217 currency before calling anyone', async () => {
    const before = env.fake.store.sessions.size;
    for (const bad of [{ amountMinor: 0 }, { amountMinor: 12.5 }, { amountMinor: -100 }, { currency: 'usd' }, { currency: 'XYZ' }, { reference: 'no-kind' }]) {
      await expect(checkoutFor(newReference(), bad)).rejects.toBeInstanceOf(RangeError);
    }
    expect(env.fake.store.sessions.size).toBe(before);
  });
});
