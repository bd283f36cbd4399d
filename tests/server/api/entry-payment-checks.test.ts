import { afterEach, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { randomUUID } from 'node:crypto';
import { config } from '@server/config';
import { sequelize } from '@server/db/sequelize';
import { AuditLine } from '@server/models/audit-line';
import { Entry } from '@server/models/entry';
import { createCheckout } from '@server/payments/checkout';
import { resetPaymentsClient } from '@server/payments/client';
import { signPayload } from '@server/payments/fake/webhooks';
import { ErrorResponseSchema } from '@shared/errors';
import { EntryTablePageSchema } from '@shared/schemas/show-day';
import { testApp } from '../../support/api-client';
import { ownerWithBuild, showWithClasses } from '../../support/event-factory';
import { countMail, waitForMailAbout } from '../../support/mailbox';
import { useFakePayments } from '../../support/payments';

// What a payment webhook may do to an entry, and how Pay behaves when the payment service is down:
// signed events are built here with this process's signing secret, as the service would sign them.
const env = useFakePayments();

async function paidShowEntry() {
  const show = await showWithClasses(); // fee €25.00
  const owner = await ownerWithBuild('Channelled sedan');
  const entered = await owner.client.post(`/api/events/${show.eventId}/entries`, { buildId: owner.build.id, classId: show.classIds[0] });
  expect(entered.status).toBe(201);
  return { ...show, owner, entryId: entered.body.entry.id as number };
}

const newEventId = () => `evt_test_${randomUUID().replaceAll('-', '')}`;
const nowSeconds = () => Math.floor(Date.now() / 1000);

function paidSession(entryId: number, checkoutId: string, overrides: Record<string, unknown> = {}) {
  return { id: checkoutId, object: 'checkout.session', status: 'complete', payment_status: 'paid', client_reference_id: `entry:${entryId}`, amount_total: 2500, currency: 'eur', payment_intent: `pi_test_${randomUUID().slice(0, 8)}`, url: null, ...overrides };
}

/** Posts an event to the webhook, signed with the endpoint's secret (at `stamp`, seconds). */
function postSigned(event: unknown, stamp = nowSeconds()) {
  const payload = typeof event === 'string' ? event : JSON.stringify(event);
  return request(testApp()).post('/api/payments/webhook').set('Content-Type', 'application/json').set('Stripe-Signature', signPayload(payload, config.payments.webhookSecret, stamp)).send(payload);
}
const completed = (session: unknown, id = newEventId()) => ({ id, object: 'event', type: 'checkout.session.completed', data: { object: session } });

const recordedEvents = async (id: string) =>
  (await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM payment_events WHERE id = $1', { bind: [id], type: QueryTypes.SELECT }))[0]!.n;

async function tableRow(organiser: Awaited<ReturnType<typeof showWithClasses>>['organiser'], eventId: number, entryId: number) {
  const res = await organiser.client.get(`/api/events/${eventId}/entry-table?pageSize=100`);
  expect(res.status).toBe(200);
  return EntryTablePageSchema.parse(res.body).rows.find((r) => r.id === entryId)!;
}

describe('a paid checkout confirms an entry only when it is the entry’s own, for the fee due', () => {
  it('keeps 1 cent, 0, another currency and two foreign checkouts as payments needing attention: 0 of 5 confirmed', async () => {
    const cases = [
      { reason: 'wrong_amount', own: true, overrides: { amount_total: 1 } },
      { reason: 'wrong_amount', own: true, overrides: { amount_total: 0 } },
      { reason: 'wrong_currency', own: true, overrides: { currency: 'usd' } },
      { reason: 'foreign_checkout', own: false, overrides: {} }, // the entry opened one, this is another
      { reason: 'foreign_checkout', own: false, overrides: {}, neverOpened: true }, // the entry never opened one
    ];
    for (const c of cases) {
      const { owner, organiser, eventId, entryId } = await paidShowEntry();
      if (!c.neverOpened) expect((await owner.client.post(`/api/entries/${entryId}/checkout`)).status).toBe(200);
      const ownCheckout = (await Entry.findByPk(entryId))!.checkoutId;
      const checkoutId = c.own ? ownCheckout! : `cs_test_${randomUUID().slice(0, 12)}`;
      const event = completed(paidSession(entryId, checkoutId, c.overrides));
      expect((await postSigned(event)).status).toBe(200);
      // The service delivers again: nothing more is recorded or sent.
      expect((await postSigned({ ...event, id: newEventId() })).status).toBe(200);

      const entry = (await Entry.findByPk(entryId))!;
      expect(entry, c.reason).toMatchObject({ status: 'awaiting_payment', paidAt: null, paymentRef: null });
      const row = await tableRow(organiser, eventId, entryId);
      expect(row.payment).toBe('unpaid');
      expect(row.paymentIssues).toEqual([expect.objectContaining({ reason: c.reason, checkoutId, amount: (c.overrides as { amount_total?: number }).amount_total ?? 2500, currency: c.reason === 'wrong_currency' ? 'USD' : 'EUR', refund: null })]);
      expect(await AuditLine.count({ where: { entryId, action: 'payment_needs_attention' } })).toBe(1);
      const mail = await waitForMailAbout(organiser.email, /needs your attention/);
      expect(mail.text).toMatch(/entry 1 \(Channelled sedan\)/);
      expect(await countMail(organiser.email)).toBe(1);
      const csv = await organiser.client.get(`/api/events/${eventId}/entries.csv`);
      expect(csv.text).toMatch(c.reason === 'foreign_checkout' ? /Paid through a checkout not opened for this entry/ : c.reason === 'wrong_currency' ? /Paid in another currency/ : /Paid an amount other than the fee/);
    }
  });

  it('keeps a real checkout someone else opened for the entry, paid on the fake’s page, without confirming it', async () => {
    const { owner, organiser, eventId, entryId } = await paidShowEntry();
    expect((await owner.client.post(`/api/entries/${entryId}/checkout`)).status).toBe(200);
    const stray = await createCheckout({
      amountMinor: 2500,
      currency: 'EUR',
      description: 'Not opened by Placard for this entry',
      reference: `entry:${entryId}`,
      idempotencyKey: `stray-${randomUUID()}`,
      successUrl: `${env.baseUrl}/entries`,
      cancelUrl: `${env.baseUrl}/entries`,
    });
    expect((await fetch(`${stray.url}/pay`, { method: 'POST', redirect: 'manual' })).status).toBe(303);
    await vi.waitFor(async () => expect((await tableRow(organiser, eventId, entryId)).paymentIssues.map((i) => i.reason)).toEqual(['foreign_checkout']), { timeout: 10_000 });
    expect((await Entry.findByPk(entryId))!.status).toBe('awaiting_payment');
  });

  it('confirms the entry with its own checkout, the fee and its currency (the control)', async () => {
    const { owner, organiser, eventId, entryId } = await paidShowEntry();
    expect((await owner.client.post(`/api/entries/${entryId}/checkout`)).status).toBe(200);
    const checkoutId = (await Entry.findByPk(entryId))!.checkoutId!;
    expect((await postSigned(completed(paidSession(entryId, checkoutId)))).status).toBe(200);
    const row = await tableRow(organiser, eventId, entryId);
    expect(row).toMatchObject({ status: 'confirmed', payment: 'paid', paidAmount: 2500, paymentIssues: [] });
  });
});

describe('webhooks of an odd shape and stamps out of time', () => {
  it('answers 400 naming the field for a signed event it cannot read, and records nothing', async () => {
    const { entryId } = await paidShowEntry();
    const session = paidSession(entryId, 'cs_test_shape');
    const odd = [
      { event: { ...completed(session), data: { object: null } }, field: 'data.object' },
      { event: { id: newEventId(), object: 'event', type: 'checkout.session.completed' }, field: 'data' },
      { event: completed({ ...session, currency: { code: 'eur' } }), field: 'data.object.currency' },
      { event: completed(session, `evt_${'x'.repeat(10_000)}`), field: 'id' },
      { event: completed({ ...session, amount_total: '2500' }), field: 'data.object.amount_total' },
    ];
    for (const { event, field } of odd) {
      const res = await postSigned(event);
      expect(res.status, field).toBe(400);
      const body = ErrorResponseSchema.parse(res.body);
      expect(Object.keys(body.error.fields ?? {})).toContain(field);
      expect(await recordedEvents((event as { id: string }).id)).toBe(0);
    }
    expect(await AuditLine.count({ where: { entryId, action: 'payment_needs_attention' } })).toBe(0);
    expect((await Entry.findByPk(entryId))!.status).toBe('awaiting_payment');
  });

  it('refuses a signature stamped an hour ahead as it refuses one an hour old; a minute of clock skew passes', async () => {
    const event = { id: newEventId(), object: 'event', type: 'customer.created', data: { object: { id: 'cus_1' } } };
    for (const stamp of [nowSeconds() + 3600, nowSeconds() - 3600]) {
      const res = await postSigned(event, stamp);
      expect(res.status).toBe(400);
      expect(ErrorResponseSchema.parse(res.body).error.message).toBe('The webhook signature does not verify.');
    }
    expect(await recordedEvents(event.id)).toBe(0);
    expect((await postSigned(event, nowSeconds() + 60)).status).toBe(200);
    expect(await recordedEvents(event.id)).toBe(1);
  });
});

describe('Pay when the payment service is down or hangs', () => {
  const saved = { timeoutMs: config.payments.timeoutMs, networkRetries: config.payments.networkRetries };
  afterEach(() => {
    env.fake.control.state = 'up';
    Object.assign(config.payments, saved);
    resetPaymentsClient();
  });

  it('answers 503 in words the entrant can act on within the bounded wait, and leaves the entry as it was', async () => {
    Object.assign(config.payments, { timeoutMs: 300, networkRetries: 1 });
    resetPaymentsClient();
    const { owner, entryId } = await paidShowEntry();
    for (const state of ['hanging', 'down'] as const) {
      env.fake.control.state = state;
      const started = Date.now();
      const res = await owner.client.post(`/api/entries/${entryId}/checkout`);
      expect(res.status, state).toBe(503);
      // Two tries of 300 ms and the SDK's pause between them, far from the 20 s it used to take.
      expect(Date.now() - started).toBeLessThan(5000);
      expect(ErrorResponseSchema.parse(res.body).error.message).toMatch(/Payments are not answering.*entry is kept.*try Pay again/);
      expect(await Entry.findByPk(entryId)).toMatchObject({ status: 'awaiting_payment', checkoutId: null, checkoutAttempt: 0 });
      expect(await AuditLine.count({ where: { entryId, action: 'checkout_opened' } })).toBe(0);
    }
    env.fake.control.state = 'up';
    const res = await owner.client.post(`/api/entries/${entryId}/checkout`);
    expect(res.status).toBe(200);
    expect(res.body.url).toMatch(/\/pay\/cs_/);
  });

  it('opens one checkout and writes one audit line for ten clicks at once', async () => {
    const { owner, entryId } = await paidShowEntry();
    const answers = await Promise.all(Array.from({ length: 10 }, () => owner.client.post(`/api/entries/${entryId}/checkout`)));
    expect(answers.map((a) => a.status)).toEqual(Array(10).fill(200));
    expect(new Set(answers.map((a) => a.body.url)).size).toBe(1);
    expect([...env.fake.store.sessions.values()].filter((s) => s.client_reference_id === `entry:${entryId}`)).toHaveLength(1);
    expect(await AuditLine.count({ where: { entryId, action: 'checkout_opened' } })).toBe(1);
  });

  it('says so when online payment is switched off, and the webhook is not there', async () => {
    const { owner, entryId } = await paidShowEntry();
    const mode = config.payments.mode;
    Object.assign(config.payments, { mode: 'off' });
    try {
      const res = await owner.client.post(`/api/entries/${entryId}/checkout`);
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/in person/);
      expect((await postSigned(completed(paidSession(entryId, 'cs_x')))).status).toBe(404);
    } finally {
      Object.assign(config.payments, { mode });
    }
  });
});
