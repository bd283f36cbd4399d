import { describe, expect, it, vi } from 'vitest';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { config } from '@server/config';
import { paymentsClient, resetPaymentsClient } from '@server/payments/client';
import { PaymentIssue } from '@server/models/payment-issue';
import { sendEntryRefund } from '@server/services/entries/entry-refunds';
import { EntryTablePageSchema } from '@shared/schemas/show-day';
import { AuditLine } from '@server/models/audit-line';
import { Entry } from '@server/models/entry';
import { Event } from '@server/models/event';
import { ownerWithBuild, showWithClasses, signedIn } from '../../support/event-factory';
import { waitForMailAbout } from '../../support/mailbox';
import { useFakePayments } from '../../support/payments';

// Entry fees through the payment SDK against the local fake: the owner pays on the fake's page, its
// signed webhook confirms the entry, and a withdrawal refunds by the show's rule through the queue.
const env = useFakePayments({ refunds: true });
const DAY = 86400_000;

/** The payer on the checkout page: press the button (a form POST) and see where it sends them. */
async function pressPay(url: string) {
  const res = await fetch(`${url}/pay`, { method: 'POST', redirect: 'manual' });
  return { status: res.status, location: res.headers.get('location') };
}

async function paidShowEntry(settings: Record<string, unknown> = {}) {
  const show = await showWithClasses({ settings });
  const owner = await ownerWithBuild('Louvred panel truck');
  const entered = await owner.client.post(`/api/events/${show.eventId}/entries`, { buildId: owner.build.id, classId: show.classIds[0] });
  expect(entered.status).toBe(201);
  return { ...show, owner, entryId: entered.body.entry.id as number };
}

const refundsOf = (entryId: number) => [...env.fake.store.refunds.values()].filter((r) => {
  const intent = [...env.fake.store.paymentIntents.values()].find((i) => i.id === r.payment_intent);
  const session = intent && env.fake.store.sessions.get(intent.session);
  return session?.client_reference_id === `entry:${entryId}`;
});

describe('paying an entry fee online', () => {
  it('opens one checkout for the fee, however often the owner clicks, and paying confirms the entry once', async () => {
    const { owner, entryId } = await paidShowEntry();
    const first = await owner.client.post(`/api/entries/${entryId}/checkout`);
    expect(first.status).toBe(200);
    const again = await owner.client.post(`/api/entries/${entryId}/checkout`);
    expect(again.body.url).toBe(first.body.url);
    const page = await (await fetch(first.body.url)).text();
    expect(page).toContain('Pay €25.00');

    const paid = await pressPay(first.body.url);
    expect(paid.status).toBe(303);
    expect(paid.location).toBe(`${new URL(paid.location!).origin}/entries?paid=${entryId}`);

    await vi.waitFor(async () => expect((await Entry.findByPk(entryId))!.status).toBe('confirmed'), { timeout: 15_000 });
    const entry = (await Entry.findByPk(entryId))!;
    expect(entry.paidAmount).toBe(2500);
    expect(entry.paymentRef).toMatch(/^checkout:cs_/);
    const mail = await waitForMailAbout(owner.email, /paid|confirmed/i);
    expect(mail.text).toMatch(/€25\.00/);
    expect(await AuditLine.count({ where: { entryId, action: 'payment_confirmed' } })).toBe(1);

    // The entry no longer waits for money: no second checkout.
    const late = await owner.client.post(`/api/entries/${entryId}/checkout`);
    expect(late.status).toBe(409);
  });

  it('opens a fresh checkout after the first one expired unpaid, and that one confirms the entry', async () => {
    const { owner, entryId } = await paidShowEntry();
    const first = await owner.client.post(`/api/entries/${entryId}/checkout`);
    // The owner left the page; the payment service expires the session.
    const sessionId = (await Entry.findByPk(entryId))!.checkoutId!;
    await paymentsClient().checkout.sessions.expire(sessionId);
    const second = await owner.client.post(`/api/entries/${entryId}/checkout`);
    expect(second.status).toBe(200);
    expect(second.body.url).not.toBe(first.body.url);
    expect((await Entry.findByPk(entryId))!.checkoutAttempt).toBe(2);
    expect((await pressPay(first.body.url)).status).toBe(409); // the expired page takes no money
    await pressPay(second.body.url);
    await vi.waitFor(async () => expect((await Entry.findByPk(entryId))!.status).toBe('confirmed'), { timeout: 15_000 });
  });

  it('is the entrant’s own: the organiser, another person and anonymous cannot open it; a free show has nothing to pay', async () => {
    const { owner, organiser, entryId } = await paidShowEntry();
    const stranger = await signedIn({ name: 'Someone Else' });
    expect((await organiser.client.post(`/api/entries/${entryId}/checkout`)).status).toBe(403);
    expect((await stranger.client.post(`/api/entries/${entryId}/checkout`)).status).toBe(404);
    expect((await owner.client.post(`/api/entries/0x${entryId.toString(16)}/checkout`)).status).toBe(400);
    expect((await owner.client.post(`/api/entries/999999999/checkout`)).status).toBe(404);
    expect((await Entry.findByPk(entryId))!.checkoutId).toBeNull();

    const free = await showWithClasses({ settings: { entryFee: 0 } });
    const other = await ownerWithBuild();
    const entered = await other.client.post(`/api/events/${free.eventId}/entries`, { buildId: other.build.id, classId: free.classIds[0] });
    const res = await other.client.post(`/api/entries/${entered.body.entry.id}/checkout`);
    expect(res.status).toBe(409);
  });

  it('refunds in full before the show’s date and by its percentage after, once, through the payment service', async () => {
    // Before the full-refund date (the factory's rule: full until 10 days from now, then 50 %).
    const early = await paidShowEntry();
    const checkout = await early.owner.client.post(`/api/entries/${early.entryId}/checkout`);
    await pressPay(checkout.body.url);
    await vi.waitFor(async () => expect((await Entry.findByPk(early.entryId))!.paidAt).not.toBeNull(), { timeout: 15_000 });
    expect((await early.owner.client.post(`/api/entries/${early.entryId}/withdraw`)).status).toBe(200);
    await vi.waitFor(async () => expect((await Entry.findByPk(early.entryId))!.refundRef).toMatch(/^re_/), { timeout: 30_000 });
    expect(refundsOf(early.entryId).map((r) => r.amount)).toEqual([2500]);
    const notice = await waitForMailAbout(early.owner.email, /Refund sent/);
    expect(notice.text).toMatch(/€25\.00 of the entry fee for Louvred panel truck/);
    expect(await AuditLine.count({ where: { entryId: early.entryId, action: 'refund_sent' } })).toBe(1);
    const mine = await early.owner.client.get('/api/entries');
    expect(mine.body.entries.find((e: { id: number }) => e.id === early.entryId)).toMatchObject({ status: 'withdrawn', refundDue: 2500, refundedAt: expect.any(String) });

    // After it: half back.
    const late = await paidShowEntry();
    const lateCheckout = await late.owner.client.post(`/api/entries/${late.entryId}/checkout`);
    await pressPay(lateCheckout.body.url);
    await vi.waitFor(async () => expect((await Entry.findByPk(late.entryId))!.paidAt).not.toBeNull(), { timeout: 15_000 });
    await Event.update({ refundRule: { fullRefundUntil: new Date(Date.now() - DAY).toISOString(), afterwardsPercent: 50 } }, { where: { id: late.eventId } });
    expect((await late.organiser.client.post(`/api/entries/${late.entryId}/withdraw`)).status).toBe(200);
    await vi.waitFor(async () => expect((await Entry.findByPk(late.entryId))!.refundRef).toMatch(/^re_/), { timeout: 30_000 });
    expect(refundsOf(late.entryId).map((r) => r.amount)).toEqual([1250]);
  });

  it('keeps a cash payment’s refund for the organiser to hand back: nothing goes to the payment service', async () => {
    const { organiser, eventId, entryId } = await paidShowEntry();
    expect((await organiser.client.post(`/api/entries/${entryId}/mark-paid`, { note: 'Cash at the office' })).status).toBe(200);
    expect((await organiser.client.post(`/api/entries/${entryId}/withdraw`)).status).toBe(200);
    const entry = (await Entry.findByPk(entryId))!;
    expect(entry.refundDue).toBe(2500);
    // No refund job was queued (pg-boss keeps every job of the queue in its table), so no money moves online.
    const jobs = await sequelize.query(`SELECT id FROM pgboss.job WHERE name = 'entry-refund' AND (data->>'entryId')::int = $1`, { bind: [entryId], type: QueryTypes.SELECT });
    expect(jobs).toEqual([]);
    expect((await Entry.findByPk(entryId))!.refundRef).toBeNull();
    expect(refundsOf(entryId)).toEqual([]);
    expect(await AuditLine.count({ where: { eventId, entryId, action: 'withdrawn_by_organiser' } })).toBe(1);
  });

  it('refunds all of a payment that arrives after the entry was withdrawn', async () => {
    const { owner, entryId } = await paidShowEntry();
    const checkout = await owner.client.post(`/api/entries/${entryId}/checkout`);
    expect((await owner.client.post(`/api/entries/${entryId}/withdraw`)).status).toBe(200);
    await pressPay(checkout.body.url); // the tab was still open
    await vi.waitFor(async () => expect((await Entry.findByPk(entryId))!.refundRef).toMatch(/^re_/), { timeout: 30_000 });
    const entry = (await Entry.findByPk(entryId))!;
    expect(entry).toMatchObject({ status: 'withdrawn', paidAmount: 2500, refundDue: 2500 });
    expect(refundsOf(entryId).map((r) => r.amount)).toEqual([2500]);
  });

  it('expires the open checkout when the organiser marks the entry paid by hand, so it cannot take the fee again', async () => {
    const { owner, organiser, entryId } = await paidShowEntry();
    const checkout = await owner.client.post(`/api/entries/${entryId}/checkout`);
    const sessionId = (await Entry.findByPk(entryId))!.checkoutId!;
    expect(env.fake.store.sessions.get(sessionId)!.status).toBe('open');
    expect((await organiser.client.post(`/api/entries/${entryId}/mark-paid`, { note: 'Cash at the club night' })).status).toBe(200);
    await vi.waitFor(async () => expect(await AuditLine.count({ where: { entryId, action: 'checkout_expired' } })).toBe(1));
    expect(env.fake.store.sessions.get(sessionId)!.status).toBe('expired');
    expect((await pressPay(checkout.body.url)).status).toBe(409); // the page takes no money now
  });

  it('records and refunds in full a payment that lands on an entry already paid in cash (the checkout could not be closed)', async () => {
    const { owner, organiser, eventId, entryId } = await paidShowEntry();
    const checkout = await owner.client.post(`/api/entries/${entryId}/checkout`);
    // The payment service is down while the organiser takes cash: marking paid still works, the checkout stays open.
    const saved = { timeoutMs: config.payments.timeoutMs, networkRetries: config.payments.networkRetries };
    Object.assign(config.payments, { timeoutMs: 200, networkRetries: 0 });
    resetPaymentsClient();
    env.fake.control.state = 'down';
    const refusedBefore = env.fake.control.refused;
    const expireAttempts = () => env.fake.control.refused - refusedBefore;
    try {
      expect((await organiser.client.post(`/api/entries/${entryId}/mark-paid`, { note: 'Cash at the office' })).status).toBe(200);
      // The attempt to close the checkout reached the fake and was dropped; the session is still open.
      await vi.waitFor(() => expect(expireAttempts()).toBeGreaterThan(0));
      expect(env.fake.store.sessions.get((await Entry.findByPk(entryId))!.checkoutId!)!.status).toBe('open');
    } finally {
      env.fake.control.state = 'up';
      Object.assign(config.payments, saved);
      resetPaymentsClient();
    }
    const cashRef = (await Entry.findByPk(entryId))!.paymentRef;
    expect(cashRef).toMatch(/^manual:/);

    expect((await pressPay(checkout.body.url)).status).toBe(303); // the entrant's tab was still open
    await vi.waitFor(async () => expect((await PaymentIssue.findOne({ where: { entryId } }))?.refundRef).toMatch(/^re_/), { timeout: 30_000 });
    const issue = (await PaymentIssue.findOne({ where: { entryId } }))!;
    expect(issue).toMatchObject({ reason: 'paid_twice', amount: 2500, currency: 'EUR', refundAmount: 2500 });
    expect(refundsOf(entryId).map((r) => r.amount)).toEqual([2500]);
    // The webhook was taken at once: no 409s retried for days.
    const deliveries = env.fake.webhooks.deliveries.filter((d) => d.type === 'checkout.session.completed' && d.payload.includes(issue.checkoutId));
    expect(deliveries.map((d) => d.status)).toEqual([200]);
    expect(await Entry.findByPk(entryId)).toMatchObject({ status: 'confirmed', paymentRef: cashRef, paidAmount: 2500 });
    expect(await AuditLine.count({ where: { entryId, action: 'payment_needs_attention' } })).toBe(1);
    expect(await AuditLine.count({ where: { entryId, action: 'refund_sent' } })).toBe(1);
    expect((await waitForMailAbout(owner.email, /Refund sent/)).text).toMatch(/€25\.00/);
    expect((await waitForMailAbout(organiser.email, /needs your attention/)).text).toMatch(/refunded in full automatically/);

    const table = EntryTablePageSchema.parse((await organiser.client.get(`/api/events/${eventId}/entry-table`)).body);
    expect(table.rows.find((r) => r.id === entryId)).toMatchObject({ payment: 'paid', paymentIssues: [{ reason: 'paid_twice', amount: 2500, refund: { amount: 2500, ref: issue.refundRef } }] });
  });

  it('marks a refund done with its amount, date and reference, in the table and the CSV, and never sends it twice', async () => {
    const { owner, organiser, eventId, entryId } = await paidShowEntry();
    const checkout = await owner.client.post(`/api/entries/${entryId}/checkout`);
    await pressPay(checkout.body.url);
    await vi.waitFor(async () => expect((await Entry.findByPk(entryId))!.paidAt).not.toBeNull(), { timeout: 15_000 });
    expect((await owner.client.post(`/api/entries/${entryId}/withdraw`)).status).toBe(200);
    await vi.waitFor(async () => expect((await Entry.findByPk(entryId))!.refundRef).toMatch(/^re_/), { timeout: 30_000 });
    const entry = (await Entry.findByPk(entryId))!;

    const row = EntryTablePageSchema.parse((await organiser.client.get(`/api/events/${eventId}/entry-table`)).body).rows[0]!;
    expect(row).toMatchObject({ payment: 'refunded', refund: { amount: 2500, ref: entry.refundRef, at: entry.refundedAt!.toISOString() } });
    const csv = (await organiser.client.get(`/api/events/${eventId}/entries.csv`)).text;
    const [header, line] = csv.replace(/^\uFEFF/, '').trim().split('\n');
    const cell = (name: string) => line!.split(',')[header!.split(',').indexOf(name)];
    expect(cell('Payment')).toBe('Refunded');
    expect(cell('Refunded')).toBe('25');
    expect(cell('Refund reference')).toBe(entry.refundRef);

    // The job delivered again (a worker retry) sends nothing more: one refund, one audit line.
    await sendEntryRefund({ entryId, amountMinor: 2500, checkoutId: entry.paymentRef!.slice('checkout:'.length) });
    expect(refundsOf(entryId)).toHaveLength(1);
    expect(await AuditLine.count({ where: { entryId, action: 'refund_sent' } })).toBe(1);
    expect((await Entry.findByPk(entryId))!.refundRef).toBe(entry.refundRef);
    // The database refuses a refund larger than what was paid, whatever asks.
    await expect(Entry.update({ refundedAmount: 2501 }, { where: { id: entryId } })).rejects.toThrow(/entries_refunded_amount/);
  });
});
