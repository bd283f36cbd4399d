import type { Transaction } from 'sequelize';
import { config } from '../../config';
import { sequelize } from '../../db/sequelize';
import { ConflictError, NotFoundError } from '../../errors';
import { logger } from '../../logger';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { User } from '../../models/user';
import { createCheckout, expireCheckout, retrieveCheckout } from '../../payments/checkout';
import type { PaymentHandler } from '../../payments/handlers';
import { writeAudit } from '../audit/audit';
import { confirmEntryPayment } from './entries';
import { CHECKOUT_REF, queueEntryRefund } from './entry-refunds';
import { mismatchOf, recordPaymentIssue } from './payment-issues';

/**
 * Where the owner pays an entry awaiting its fee: the entry's open checkout if it has one, else a
 * new one. The idempotency key carries the attempt number, so a double click opens one checkout and
 * an expired one is replaced by a fresh one. A payment service that is down or hangs is a 503 after
 * the SDK's bounded wait (PaymentsUnavailableError), with nothing written.
 */
export async function openEntryCheckout(entryId: number): Promise<{ url: string }> {
  const entry = await Entry.findByPk(entryId, { include: [{ model: Event, as: 'event' }, { model: User, as: 'owner', attributes: ['id', 'email'] }] });
  if (!entry?.event) throw new NotFoundError('No such entry.');
  if (entry.status !== 'awaiting_payment' || entry.paidAt) throw new ConflictError('This entry does not wait for a payment.');
  if (entry.feeAmount <= 0) throw new ConflictError('This show is free: there is nothing to pay.');
  if (config.payments.mode === 'off') throw new ConflictError('This show takes its fee in person: online payment is switched off.');
  if (entry.checkoutId) {
    const open = await retrieveCheckout(entry.checkoutId);
    if (open.status === 'open' && open.url) return { url: open.url };
  }
  const attempt = entry.checkoutAttempt + 1;
  const base = config.publicBaseUrl;
  const checkout = await createCheckout({
    amountMinor: entry.feeAmount,
    currency: entry.currency,
    description: `Entry ${entry.number} — ${entry.event.name}`,
    reference: `entry:${entry.id}`,
    idempotencyKey: `entry-${entry.id}-attempt-${attempt}`,
    successUrl: `${base}/entries?paid=${entry.id}`,
    cancelUrl: `${base}/entries`,
    ...(entry.owner?.email ? { customerEmail: entry.owner.email } : {}),
  });
  await sequelize.transaction(async (transaction) => {
    // Clicks at once made the same checkout (same key): the first to take the row records it, the rest find it recorded.
    const locked = await Entry.findByPk(entry.id, { lock: transaction.LOCK.UPDATE, transaction });
    if (!locked || locked.checkoutId === checkout.id || locked.checkoutAttempt >= attempt) return;
    await locked.update({ checkoutId: checkout.id, checkoutAttempt: attempt }, { transaction });
    await writeAudit({ eventId: entry.eventId, entryId: entry.id, actorId: entry.ownerId, action: 'checkout_opened', before: null, after: { checkoutId: checkout.id } }, transaction);
  });
  if (!checkout.url) throw new ConflictError('The payment service did not open a checkout; try again.');
  return { url: checkout.url };
}

/**
 * After a fee is taken by hand, the entry's online checkout must not take it again: it is expired
 * through the SDK (an audit line says so). If the service cannot be reached the checkout stays open,
 * and a payment that still lands is refunded in full by the webhook handler below.
 */
export async function expireCheckoutPaidElsewhere(entry: Pick<Entry, 'id' | 'eventId' | 'checkoutId'>): Promise<void> {
  if (!entry.checkoutId) return;
  try {
    if (!(await expireCheckout(entry.checkoutId))) return;
    await sequelize.transaction((transaction) =>
      writeAudit({ eventId: entry.eventId, entryId: entry.id, actorId: null, action: 'checkout_expired', before: { checkoutId: entry.checkoutId }, after: { reason: 'paid by hand' } }, transaction),
    );
  } catch (err) {
    logger.warn({ err, entryId: entry.id, checkoutId: entry.checkoutId }, 'could not expire the checkout of an entry paid by hand: a late payment will be refunded');
  }
}

/** Locks the show, then the entry: the order registration and confirmation use, so they never deadlock. */
async function lockEntry(entryId: number, transaction: Transaction): Promise<Entry | null> {
  const first = await Entry.findByPk(entryId, { attributes: ['id', 'eventId'], transaction });
  if (!first) return null;
  await Event.findByPk(first.eventId, { lock: transaction.LOCK.UPDATE, transaction });
  return Entry.findByPk(entryId, { lock: transaction.LOCK.UPDATE, transaction });
}

/**
 * The payment service's webhook for `entry:<id>`: only the checkout opened for the entry, for the fee
 * in its currency, confirms it (once, however often it is delivered). Any other payment is kept as a
 * payment issue for the organiser; a second payment of a paid entry is also refunded in full. Wired in
 * `createApp()` (server/app.ts), never by importing this file.
 */
export const handleEntryPayment: PaymentHandler = async (notice, transaction) => {
  if (notice.kind !== 'paid') return;
  const entryId = Number(notice.referenceId);
  const entry = Number.isSafeInteger(entryId) ? await lockEntry(entryId, transaction) : null;
  if (!entry) {
    // No entry to show it on and no organiser to tell: logged loudly, and the service keeps the payment's record.
    logger.error({ reference: notice.reference, checkoutId: notice.checkout.id, amount: notice.checkout.amountMinor }, 'payment for an entry that does not exist');
    return;
  }
  const paymentRef = `${CHECKOUT_REF}${notice.checkout.id}`;
  if (entry.paidAt && entry.paymentRef === paymentRef) return; // this payment is the one recorded
  const mismatch = mismatchOf(entry, notice.checkout);
  if (mismatch) return recordPaymentIssue(entry, notice.checkout, mismatch, notice.eventId, transaction);
  if (entry.paidAt) return recordPaymentIssue(entry, notice.checkout, 'paid_twice', notice.eventId, transaction);
  const confirmed = await confirmEntryPayment(entryId, paymentRef, { amount: notice.checkout.amountMinor, transaction });
  // Paid after withdrawing (the checkout was still open): nothing was bought, so all of it goes back.
  if (confirmed.changed && confirmed.entry.status === 'withdrawn') {
    await confirmed.entry.update({ refundDue: confirmed.entry.paidAmount }, { transaction });
    await queueEntryRefund(confirmed.entry, confirmed.entry.paidAmount ?? 0, transaction);
  }
};
