import { PAYMENT_METHODS, paymentMethodOf, type MoneyTotals } from '@shared/schemas/money-totals';
import { Entry } from '../../models/entry';

/** Totals of a show's money, from its entries: collected and refunded by how the fee was paid, refunds due, fees owed. */
export async function moneyTotals(eventId: number, currency: string): Promise<MoneyTotals> {
  const entries = await Entry.findAll({ where: { eventId }, attributes: ['id', 'status', 'feeAmount', 'paymentRef', 'paidAt', 'paidAmount', 'refundDue', 'refundedAt', 'refundedAmount'] });
  const byMethod = PAYMENT_METHODS.map((method) => {
    const paid = entries.filter((e) => e.paidAt && paymentMethodOf(e.paymentRef) === method);
    return {
      method,
      collected: paid.reduce((t, e) => t + (e.paidAmount ?? 0), 0),
      refunded: paid.filter((e) => e.refundedAt).reduce((t, e) => t + (e.refundedAmount ?? e.refundDue ?? 0), 0),
      refundsDue: paid.filter((e) => !e.refundedAt && (e.refundDue ?? 0) > 0).reduce((t, e) => t + (e.refundDue ?? 0), 0),
    };
  });
  const sum = (k: 'collected' | 'refunded' | 'refundsDue') => byMethod.reduce((t, m) => t + m[k], 0);
  const feesDue = entries.filter((e) => e.status === 'awaiting_payment' && !e.paidAt).reduce((t, e) => t + e.feeAmount, 0);
  return { currency, byMethod, collected: sum('collected'), refunded: sum('refunded'), refundsDue: sum('refundsDue'), feesDue };
}
