import type { Transaction } from 'sequelize';
import { formatMoney } from '@shared/calc/money';
import { formatInZone } from '@shared/calc/time-zone';
import { entryReceivedEmail } from '@templates/email/entry-received';
import { waitlistOfferEmail } from '@templates/email/waitlist-offer';
import { entryWithdrawnEmail } from '@templates/email/entry-withdrawn';
import { paymentConfirmedEmail } from '@templates/email/payment-confirmed';
import { refundSentEmail } from '@templates/email/refund-sent';
import { config } from '../../config';
import { queueMail } from '../../mail/outbox';
import { Build } from '../../models/build';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import type { Entry } from '../../models/entry';
import type { Event } from '../../models/event';

/** The notices an entrant gets about one entry, each queued in the transaction that made the change. */
async function parts(entry: Entry, transaction: Transaction) {
  // One after another: queries in one transaction share one connection.
  const owner = await User.findByPk(entry.ownerId, { attributes: ['email', 'name'], transaction });
  const build = await Build.findByPk(entry.buildId, { attributes: ['title'], transaction });
  const cls = await EventClass.findByPk(entry.classId, { attributes: ['name'], transaction });
  return { to: owner?.email ?? '', name: owner?.name ?? '', buildTitle: build?.title ?? '', className: cls?.name ?? '' };
}
const myEntriesLink = () => `${config.publicBaseUrl}/entries`;

export async function mailEntryReceived(entry: Entry, event: Event, transaction: Transaction) {
  const p = await parts(entry, transaction);
  if (entry.status !== 'confirmed' && entry.status !== 'awaiting_payment' && entry.status !== 'waiting_list') return;
  const mail = entryReceivedEmail({ ...p, showName: event.name, number: entry.number, state: entry.status, fee: formatMoney(entry.feeAmount, entry.currency), link: myEntriesLink() });
  await queueMail({ to: p.to, ...mail }, { transaction, dedupeKey: `entry-received:${entry.id}:${entry.status}` });
}

export async function mailOffer(entry: Entry, event: Event, transaction: Transaction) {
  const p = await parts(entry, transaction);
  const deadline = formatInZone(entry.offerExpiresAt!.toISOString(), event.timeZone, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', hour: '2-digit', minute: '2-digit', timeZoneName: 'short' });
  const mail = waitlistOfferEmail({ ...p, showName: event.name, deadline, link: myEntriesLink() });
  await queueMail({ to: p.to, ...mail }, { transaction, dedupeKey: `offer:${entry.id}:${entry.offerExpiresAt!.getTime()}` });
}

export async function mailWithdrawn(entry: Entry, event: Event, byOrganiser: boolean, transaction: Transaction) {
  const p = await parts(entry, transaction);
  const refund = entry.refundDue ? formatMoney(entry.refundDue, entry.currency) : null;
  await queueMail({ to: p.to, ...entryWithdrawnEmail({ ...p, showName: event.name, byOrganiser, refund }) }, { transaction, dedupeKey: `withdrawn:${entry.id}` });
}

/**
 * One "payment received" per payment. An online payment is named by its reference; money taken by hand
 * (cash at the gate, marked paid) is one payment per entry: the gate's undo hands the cash back and a
 * second take is the same payment again, whose fresh reference must not mail the owner twice.
 */
const paymentMailKey = (entry: Entry) => (entry.paymentRef?.startsWith('manual:') ? `paid:${entry.id}:manual` : `paid:${entry.id}:${entry.paymentRef}`);

export async function mailPaymentConfirmed(entry: Entry, event: Event, transaction: Transaction) {
  const p = await parts(entry, transaction);
  const mail = paymentConfirmedEmail({ ...p, showName: event.name, number: entry.number, amount: formatMoney(entry.paidAmount ?? entry.feeAmount, entry.currency), link: myEntriesLink() });
  await queueMail({ to: p.to, ...mail }, { transaction, dedupeKey: paymentMailKey(entry) });
}

export async function mailRefundSent(entry: Entry, event: Event, amountMinor: number, transaction: Transaction, dedupeKey = `refund:${entry.id}`) {
  const p = await parts(entry, transaction);
  const mail = refundSentEmail({ ...p, showName: event.name, amount: formatMoney(amountMinor, entry.currency), link: myEntriesLink() });
  await queueMail({ to: p.to, ...mail }, { transaction, dedupeKey });
}
