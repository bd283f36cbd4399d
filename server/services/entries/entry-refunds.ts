import type { Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { jobQueue, REFUND_QUEUE } from '../../jobs/queue';
import { logger } from '../../logger';
import { Entry } from '../../models/entry';
import { refund } from '../../payments/checkout';
import { writeAudit } from '../audit/audit';
import { mailRefundSent } from './entry-mail';
import { Event } from '../../models/event';

/** Entry fees paid online carry `checkout:<id>` as their payment reference; cash at the gate is `manual:<uuid>`. */
export const CHECKOUT_REF = 'checkout:';
export const paidOnline = (entry: Pick<Entry, 'paymentRef'>) => Boolean(entry.paymentRef?.startsWith(CHECKOUT_REF));

export type RefundJob = { entryId: number; amountMinor: number; checkoutId: string };

/**
 * Queued inside the withdrawal's transaction, so the refund is asked for only if the withdrawal
 * commits. A fee taken in cash is the organiser's to hand back: it stays as the refund due.
 */
export async function queueEntryRefund(entry: Entry, amountMinor: number, transaction: Transaction): Promise<void> {
  if (amountMinor <= 0 || !paidOnline(entry)) return;
  const job: RefundJob = { entryId: entry.id, amountMinor, checkoutId: entry.paymentRef!.slice(CHECKOUT_REF.length) };
  await jobQueue().send(REFUND_QUEUE, job, transaction);
}

/** The refund worker's step: one refund per entry, ever (the idempotency key is the entry's). */
export async function sendEntryRefund(job: RefundJob): Promise<void> {
  const entry = await Entry.findByPk(job.entryId);
  if (!entry || entry.refundRef) return;
  const made = await refund({ checkoutId: job.checkoutId, amountMinor: job.amountMinor, idempotencyKey: `entry-${job.entryId}-refund` });
  await sequelize.transaction(async (transaction) => {
    await Entry.update({ refundRef: made.id, refundedAt: new Date() }, { where: { id: entry.id }, transaction });
    await writeAudit({ eventId: entry.eventId, entryId: entry.id, actorId: null, action: 'refund_sent', before: { refundDue: entry.refundDue }, after: { refundRef: made.id, amount: made.amountMinor } }, transaction);
    const event = await Event.findByPk(entry.eventId, { transaction });
    if (event) await mailRefundSent(entry, event, made.amountMinor, transaction);
  });
  logger.info({ entryId: entry.id, refund: made.id, amount: made.amountMinor }, 'entry fee refunded');
}
