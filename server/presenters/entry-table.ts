import type { MoneyTotals } from '@shared/schemas/money-totals';
import { paymentStateOf, type EntryTableRow, type PaymentIssueRow, type RefundSent } from '@shared/schemas/show-day';
import type { Entry } from '../models/entry';
import type { PaymentIssue } from '../models/payment-issue';
import type { Actor } from '../policies/actor';
import { entrantFieldsVisibleTo, type EntrantField } from '../policies/private-fields';

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
 * A row of the organiser's entries table. Of the entrant's contact details and the build's private
 * fields it carries only what the private-field policy lets this person see (null for the rest).
 */
export function presentEntryTableRow(e: Entry, places: Map<number, number>, actor: Actor): EntryTableRow {
  const sees = entrantFieldsVisibleTo(actor, e);
  const only = <T>(field: EntrantField, value: T) => (sees.has(field) ? value : null);
  return {
    id: e.id,
    number: e.number,
    buildId: e.buildId,
    buildTitle: e.build?.title ?? '',
    buildCode: e.build?.code ?? '',
    modelYear: e.build?.modelYear ?? null,
    bodyOrigin: e.build?.bodyOrigin ?? null,
    // A walk-up's car is held by the show's creator: the entrant is the person named at the gate.
    ownerName: e.walkUpName ?? e.owner?.name ?? '',
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
    offerExpiresAt: e.status === 'waiting_list' && e.offerExpiresAt ? e.offerExpiresAt.toISOString() : null,
    createdAt: e.createdAt.toISOString(),
    contact: { email: only('email', e.walkUpName !== null ? e.walkUpEmail : (e.owner?.email ?? null)) ?? '', phone: only('phone', e.build?.ownerPhone ?? null) },
    privateFields: { vin: only('vin', e.build?.vin ?? null), plate: only('plate', e.build?.plate ?? null), address: only('address', e.build?.ownerAddress ?? null) },
    sharedFields: [...e.sharedFields],
  };
}

/** The money totals, field by field. */
export const presentMoneyTotals = (t: MoneyTotals): MoneyTotals => ({
  currency: t.currency,
  byMethod: t.byMethod.map((m) => ({ method: m.method, collected: m.collected, refunded: m.refunded, refundsDue: m.refundsDue })),
  collected: t.collected,
  refunded: t.refunded,
  refundsDue: t.refundsDue,
  feesDue: t.feesDue,
});
