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

/** The gate screen's words, the same on the screen the server draws first and on the app's (server/first-screens). */
export const GATE_WORDS = {
  heading: (showName: string) => `Gate · ${showName}`,
  scan: 'Scan a card',
  entryNumber: 'Entry number',
  find: 'Find',
  /** Under the gate the server draws, until the app's code has arrived. */
  stillLoading: 'The camera and the check-in buttons are on their way.',
  /** The scanned car's lines: "No. 12", "Class: Hot rods", "Payment: Paid". */
  numberPrefix: 'No. ',
  classPrefix: 'Class: ',
  paymentPrefix: 'Payment: ',
  lookUpFailed: 'That look-up did not go through. Send it again.',
} as const;
