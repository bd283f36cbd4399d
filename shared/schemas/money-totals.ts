import { z } from 'zod';

/** How an entry fee was paid: online through the payment service, or by hand (cash at the gate, a transfer). */
export const PAYMENT_METHODS = ['online', 'by_hand'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];
export const PAYMENT_METHOD_LABELS: Record<PaymentMethod, string> = { online: 'Online', by_hand: 'By hand (cash, transfer)' };

/** A fee taken by hand carries a `manual:` reference (see recordManualPayment); anything else came through the payment service. */
export const paymentMethodOf = (paymentRef: string | null): PaymentMethod | null => (paymentRef === null ? null : paymentRef.startsWith('manual:') ? 'by_hand' : 'online');

const MethodTotalsSchema = z.object({ method: z.enum(PAYMENT_METHODS), collected: z.number(), refunded: z.number(), refundsDue: z.number() });
/** Money at a glance, in minor units of the show's currency: per method, then fees still owed by entrants. */
export const MoneyTotalsSchema = z.object({
  currency: z.string(),
  byMethod: z.array(MethodTotalsSchema),
  collected: z.number(),
  refunded: z.number(),
  refundsDue: z.number(),
  /** Fees of entries awaiting payment: what entrants still owe. */
  feesDue: z.number(),
});
export type MoneyTotals = z.infer<typeof MoneyTotalsSchema>;

export const MONEY_TOTAL_LABELS = { collected: 'Collected', refunded: 'Refunded', refundsDue: 'Refunds due', feesDue: 'Fees still owed' } as const;
