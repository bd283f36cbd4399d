import type { Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { jobQueue, REFUND_QUEUE } from '../../jobs/queue';
import { logger } from '../../logger';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { PaymentIssue } from '../../models/payment-issue';
import { refund } from '../../payments/checkout';
import { writeAudit } from '../audit/audit';
import { mailRefundSent } from './entry-mail';

/** Entry fees paid online carry `checkout:<id>` as their payment reference; cash at the gate is `manual:<uuid>`. */
export const CHECKOUT_REF = 'checkout:';
export const paidOnline = (entry: Pick<Entry, 'paymentRef'>) => Boolean(entry.paymentRef?.startsWith(CHECKOUT_REF));

/** The entry's own fee back after a withdrawal, or (with `issueId`) a payment kept as an issue. */
export type RefundJob = { entryId: number; amountMinor: number; checkoutId: string; issueId?: number };

/**
 * Queued inside the withdrawal's transaction, so the refund is asked for only if the withdrawal
 * commits. A fee taken in cash is the organiser's to hand back: it stays as the refund due.
 */
export async function queueEntryRefund(entry: Entry, amountMinor: number, transaction: Transaction): Promise<void> {
  if (amountMinor <= 0 || !paidOnline(entry)) return;
  const job: RefundJob = { entryId: entry.id, amountMinor, checkoutId: entry.paymentRef!.slice(CHECKOUT_REF.length) };
  await jobQueue().send(REFUND_QUEUE, job, transaction);
}

/** All of a payment kept as an issue goes back (an entry paid twice), queued in the webhook's transaction. */
export async function queueIssueRefund(issue: PaymentIssue, transaction: Transaction): Promise<void> {
  if (issue.amount <= 0) return;
  const job: RefundJob = { entryId: issue.entryId, amountMinor: issue.amount, checkoutId: issue.checkoutId, issueId: issue.id };
  await jobQueue().send(REFUND_QUEUE, job, transaction);
}

/** The refund worker's step: one refund per payment, ever (the idempotency key is the payment's, and a sent refund is never asked for again). */
export async function sendEntryRefund(job: RefundJob): Promise<void> {
  if (job.issueId !== undefined) return sendIssueRefund(job, job.issueId);
  const entry = await Entry.findByPk(job.entryId);
  if (!entry || entry.refundRef) return;
  const made = await refund({ checkoutId: job.checkoutId, amountMinor: job.amountMinor, idempotencyKey: `entry-${job.entryId}-refund` });
  if (await recordEntryRefund(entry.id, made)) logger.info({ entryId: entry.id, refund: made.id, amount: made.amountMinor }, 'entry fee refunded');
}

/**
 * Records a refund the payment service made for an entry: its reference, the amount, the history line and
 * the entrant's notice. False when the entry already has one (two deliveries of the job at once record it once).
 */
export async function recordEntryRefund(entryId: number, made: { id: string; amountMinor: number }): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    // Locked and read again: two deliveries of the job at once record the one refund once.
    const locked = await Entry.findByPk(entryId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!locked || locked.refundRef) return false;
    await locked.update({ refundRef: made.id, refundedAt: new Date(), refundedAmount: made.amountMinor }, { transaction });
    await writeAudit({ eventId: locked.eventId, entryId: locked.id, actorId: null, action: 'refund_sent', before: { refundDue: locked.refundDue }, after: { refundRef: made.id, amount: made.amountMinor } }, transaction);
    const event = await Event.findByPk(locked.eventId, { transaction });
    if (event) await mailRefundSent(locked, event, made.amountMinor, transaction);
    return true;
  });
}

async function sendIssueRefund(job: RefundJob, issueId: number): Promise<void> {
  const issue = await PaymentIssue.findByPk(issueId);
  if (!issue || issue.refundRef) return;
  const made = await refund({ checkoutId: issue.checkoutId, amountMinor: issue.amount, idempotencyKey: `payment-issue-${issue.id}-refund` });
  await sequelize.transaction(async (transaction) => {
    const locked = await PaymentIssue.findByPk(issue.id, { lock: transaction.LOCK.UPDATE, transaction });
    if (!locked || locked.refundRef) return;
    await locked.update({ refundRef: made.id, refundedAt: new Date(), refundAmount: made.amountMinor }, { transaction });
    await writeAudit({ eventId: locked.eventId, entryId: locked.entryId, actorId: null, action: 'refund_sent', before: { paymentIssue: locked.id, checkoutId: locked.checkoutId }, after: { refundRef: made.id, amount: made.amountMinor } }, transaction);
    const entry = await Entry.findByPk(locked.entryId, { transaction });
    const event = entry && (await Event.findByPk(entry.eventId, { transaction }));
    if (entry && event) await mailRefundSent(entry, event, made.amountMinor, transaction, `refund:issue:${locked.id}`);
  });
  logger.info({ entryId: job.entryId, paymentIssue: issue.id, refund: made.id, amount: made.amountMinor }, 'second payment of an entry refunded');
}
