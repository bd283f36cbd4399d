/**
 * A show's refund rule: the whole fee back until a date, then a set percentage (0 = none).
 * The rule is the show's own, chosen by its organiser; rounding down to the minor unit is our
 * choice (common practice: never refund more than was set), not a published standard.
 */
export type RefundRule = { fullRefundUntil: string | null; afterwardsPercent: number };

export function refundDue(paidMinor: number, rule: RefundRule, withdrawnAt: Date): number {
  if (!Number.isInteger(paidMinor) || paidMinor <= 0) return 0;
  if (rule.fullRefundUntil && withdrawnAt.getTime() <= new Date(rule.fullRefundUntil).getTime()) return paidMinor;
  const percent = Math.min(100, Math.max(0, rule.afterwardsPercent));
  return Math.floor((paidMinor * percent) / 100);
}
