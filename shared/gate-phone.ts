// What the gate's phone screen needs from the show-day schemas, kept free of zod: the screen must open on
// one bar of signal and with none, so its first download carries no schema library. The schemas
// (`schemas/show-day.ts`) re-export these.

export const PAYMENT_STATES = ['free', 'unpaid', 'paid', 'refund_due', 'refunded'] as const;
export type PaymentState = (typeof PAYMENT_STATES)[number];
export const PAYMENT_STATE_LABELS: Record<PaymentState, string> = { free: 'Free', unpaid: 'Unpaid', paid: 'Paid', refund_due: 'Refund due', refunded: 'Refunded' };

/** Undo a check-in within this long (seconds). */
export const CHECK_IN_UNDO_SECONDS = 60;

/** At most this many queued check-ins go in one request (a phone sends the rest next). */
export const GATE_SYNC_MAX = 100;
