import type { Transaction } from 'sequelize';
import { formatMoney } from '@shared/calc/money';
import { PAYMENT_ISSUE_LABELS, type PaymentIssueReason } from '@shared/schemas/show-day';
import { paymentNeedsAttentionEmail } from '@templates/email/payment-needs-attention';
import { config } from '../../config';
import { queueMail } from '../../mail/outbox';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventMembership } from '../../models/event-membership';
import { PaymentIssue } from '../../models/payment-issue';
import { User } from '../../models/user';
import type { Checkout } from '../../payments/checkout';
import { writeAudit } from '../audit/audit';
import { queueIssueRefund } from './entry-refunds';

/**
 * Pure: why a paid checkout does not simply pay this entry's fee, or null when it does. Only the
 * checkout opened for the entry, for the fee due in its currency, confirms it.
 */
export function mismatchOf(entry: Pick<Entry, 'checkoutId' | 'feeAmount' | 'currency'>, checkout: Pick<Checkout, 'id' | 'amountMinor' | 'currency'>): PaymentIssueReason | null {
  if (!entry.checkoutId || checkout.id !== entry.checkoutId) return 'foreign_checkout';
  if (checkout.currency !== entry.currency) return 'wrong_currency';
  if (checkout.amountMinor !== entry.feeAmount) return 'wrong_amount';
  return null;
}

/**
 * Keeps a payment that did not simply pay the entry's fee, in the webhook's transaction: one row per
 * checkout, an audit line and one e-mail to each organiser. A second payment of an entry already paid
 * is refunded in full through the refund queue; anything else is left for the organiser to settle.
 */
export async function recordPaymentIssue(entry: Entry, checkout: Checkout, reason: PaymentIssueReason, webhookEventId: string, transaction: Transaction): Promise<void> {
  const existing = await PaymentIssue.findOne({ where: { checkoutId: checkout.id }, transaction });
  if (existing) return; // another event about the same payment (completed, then async succeeded)
  const issue = await PaymentIssue.create(
    {
      eventId: entry.eventId,
      entryId: entry.id,
      reason,
      checkoutId: checkout.id,
      paymentIntentId: checkout.paymentIntentId,
      amount: checkout.amountMinor,
      currency: checkout.currency,
      webhookEventId,
    },
    { transaction },
  );
  await writeAudit(
    { eventId: entry.eventId, entryId: entry.id, actorId: null, action: 'payment_needs_attention', before: null, after: { reason, checkoutId: checkout.id, amount: checkout.amountMinor, currency: checkout.currency } },
    transaction,
  );
  if (reason === 'paid_twice') await queueIssueRefund(issue, transaction);
  await mailOrganisers(entry, issue, transaction);
}

async function mailOrganisers(entry: Entry, issue: PaymentIssue, transaction: Transaction) {
  const event = await Event.findByPk(entry.eventId, { attributes: ['id', 'name'], transaction });
  const build = await Build.findByPk(entry.buildId, { attributes: ['title'], transaction });
  const organisers = await EventMembership.findAll({ where: { eventId: entry.eventId, role: 'organiser' }, include: [{ model: User, as: 'user', attributes: ['id', 'email'] }], transaction });
  const mail = paymentNeedsAttentionEmail({
    showName: event?.name ?? '',
    number: entry.number,
    buildTitle: build?.title ?? '',
    what: PAYMENT_ISSUE_LABELS[issue.reason],
    amount: formatMoney(issue.amount, issue.currency),
    fee: formatMoney(entry.feeAmount, entry.currency),
    refunded: issue.reason === 'paid_twice',
    link: `${config.publicBaseUrl}/shows/${entry.eventId}/entries`,
  });
  for (const m of organisers) {
    if (m.user?.email) await queueMail({ to: m.user.email, ...mail }, { transaction, dedupeKey: `payment-issue:${issue.id}:${m.userId}` });
  }
}

/** The organiser's table and CSV show each entry's payment issues: one query for a page of rows. */
export async function attachPaymentIssues(rows: Entry[]): Promise<void> {
  if (rows.length === 0) return;
  const issues = await PaymentIssue.findAll({ where: { entryId: rows.map((r) => r.id) }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
  for (const row of rows) row.paymentIssues = issues.filter((i) => i.entryId === row.id);
}
