import type { Transaction } from 'sequelize';
import type { Checkout } from './checkout';

/** What a webhook tells the part of the product that asked for the payment. */
export type PaymentNotice = {
  kind: 'paid' | 'expired' | 'failed';
  /** The whole reference (`entry:42`) and its id part (`42`). */
  reference: string;
  referenceId: string;
  checkout: Checkout;
  eventId: string;
};

/** Runs inside the transaction that records the event: if it throws, nothing is recorded and the service retries. */
export type PaymentHandler = (notice: PaymentNotice, transaction: Transaction) => Promise<void>;

const handlers = new Map<string, PaymentHandler>();

/**
 * One handler per kind of reference, e.g. registerPaymentHandler('entry', handleEntryPayment), called
 * where the app is assembled. The same handler again is a no-op (each app made in a process wires it);
 * a different one for a kind already claimed is a mistake.
 */
export function registerPaymentHandler(kind: string, handler: PaymentHandler): () => void {
  const existing = handlers.get(kind);
  if (existing === handler) return () => void handlers.delete(kind);
  if (existing) throw new Error(`A payment handler for "${kind}" is registered already.`);
  handlers.set(kind, handler);
  return () => void handlers.delete(kind);
}

export const paymentHandlerFor = (kind: string) => handlers.get(kind);
