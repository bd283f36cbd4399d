import { paymentStateOf, type EntryTableRow, type PaymentIssueRow, type RefundSent } from '@shared/schemas/show-day';
import type { Entry } from '../models/entry';
import type { PaymentIssue } from '../models/payment-issue';

const refundOf = (r: { refundAmount: number | null; refundRef: string | null; refundedAt: Date | null }): RefundSent | null =>
  r.refundRef && r.refundedAt && r.refundAmount !== null ? { amount: r.refundAmount, at: r.refundedAt.toISOString(), ref: r.refundRef } : null;

const presentIssue = (i: PaymentIssue): PaymentIssueRow => ({
  id: i.id,
  reason: i.reason,
  amount: i.amount,
  currency: i.currency,
  checkoutId: i.checkoutId,
  at: i.createdAt.toISOString(),
  refund: refundOf(i),
});

/**
 * A row of the organiser's entries table. It carries the entrant's e-mail and phone and the
 * build's private fields: only the entries-table routes, which the policy opens to the show's
 * organisers alone, use it.
 */
export function presentEntryTableRow(e: Entry, places: Map<number, number>): EntryTableRow {
  return {
    id: e.id,
    number: e.number,
    buildId: e.buildId,
    buildTitle: e.build?.title ?? '',
    buildCode: e.build?.code ?? '',
    ownerName: e.owner?.name ?? '',
    classId: e.classId,
    className: e.eventClass?.name ?? '',
    status: e.status,
    payment: paymentStateOf(e),
    feeAmount: e.feeAmount,
    paidAmount: e.paidAmount,
    refundDue: e.refundDue,
    refund: refundOf({ refundAmount: e.refundedAmount, refundRef: e.refundRef, refundedAt: e.refundedAt }),
    paymentIssues: (e.paymentIssues ?? []).map(presentIssue),
    currency: e.currency,
    paymentRef: e.paymentRef,
    checkedInAt: e.checkedInAt ? e.checkedInAt.toISOString() : null,
    waitingPosition: places.get(e.id) ?? null,
    createdAt: e.createdAt.toISOString(),
    contact: { email: e.owner?.email ?? '', phone: e.build?.ownerPhone ?? null },
    privateFields: { vin: e.build?.vin ?? null, plate: e.build?.plate ?? null, address: e.build?.ownerAddress ?? null },
  };
}
