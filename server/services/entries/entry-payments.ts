import { config } from '../../config';
import { sequelize } from '../../db/sequelize';
import { ConflictError, NotFoundError } from '../../errors';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { User } from '../../models/user';
import { createCheckout, retrieveCheckout } from '../../payments/checkout';
import type { PaymentHandler } from '../../payments/handlers';
import { writeAudit } from '../audit/audit';
import { confirmEntryPayment } from './entries';
import { CHECKOUT_REF, queueEntryRefund } from './entry-refunds';

/**
 * Where the owner pays an entry awaiting its fee: the entry's open checkout if it has one, else a
 * new one. The idempotency key carries the attempt number, so a double click opens one checkout and
 * an expired one is replaced by a fresh one.
 */
export async function openEntryCheckout(entryId: number): Promise<{ url: string }> {
  const entry = await Entry.findByPk(entryId, { include: [{ model: Event, as: 'event' }, { model: User, as: 'owner', attributes: ['id', 'email'] }] });
  if (!entry?.event) throw new NotFoundError('No such entry.');
  if (entry.status !== 'awaiting_payment' || entry.paidAt) throw new ConflictError('This entry does not wait for a payment.');
  if (entry.feeAmount <= 0) throw new ConflictError('This show is free: there is nothing to pay.');
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
    // Two clicks at once made the same checkout (same key); the second update writes the same values.
    await Entry.update({ checkoutId: checkout.id, checkoutAttempt: attempt }, { where: { id: entry.id }, transaction });
    if (attempt !== entry.checkoutAttempt) {
      await writeAudit({ eventId: entry.eventId, entryId: entry.id, actorId: entry.ownerId, action: 'checkout_opened', before: null, after: { checkoutId: checkout.id } }, transaction);
    }
  });
  if (!checkout.url) throw new ConflictError('The payment service did not open a checkout; try again.');
  return { url: checkout.url };
}

/**
 * The payment service's webhook for `entry:<id>`: a paid checkout confirms the entry (once, however
 * often it is delivered). Wired in `createApp()` (server/app.ts), never by importing this file.
 */
export const handleEntryPayment: PaymentHandler = async (notice, transaction) => {
  if (notice.kind !== 'paid') return;
  const entryId = Number(notice.referenceId);
  if (!Number.isSafeInteger(entryId)) return;
  const { entry, changed } = await confirmEntryPayment(entryId, `${CHECKOUT_REF}${notice.checkout.id}`, { amount: notice.checkout.amountMinor, transaction });
  // Paid after withdrawing (the checkout was still open): nothing was bought, so all of it goes back.
  if (changed && entry.status === 'withdrawn') {
    await entry.update({ refundDue: entry.paidAmount }, { transaction });
    await queueEntryRefund(entry, entry.paidAmount ?? 0, transaction);
  }
};
