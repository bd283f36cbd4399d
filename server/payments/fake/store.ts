import { randomBytes } from 'node:crypto';

/** What the fake keeps, in memory: it forgets everything when it stops (a real key keeps nothing here). */
export type FakeSession = {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  mode: 'payment';
  payment_intent: string | null;
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete' | 'expired';
  url: string | null;
  success_url: string;
  cancel_url: string | null;
  created: number;
  expires_at: number;
  livemode: false;
  /** Not part of the session object the service returns: the line the pay page shows. */
  description: string;
};

export type FakePaymentIntent = { id: string; amount: number; amount_refunded: number; currency: string; session: string };

export type FakeRefund = {
  id: string;
  object: 'refund';
  amount: number;
  currency: string;
  payment_intent: string;
  status: 'succeeded';
  created: number;
  metadata: Record<string, string>;
};

export type StoredAnswer = { fingerprint: string; status: number; body: unknown };

export const newId = (prefix: string) => `${prefix}_fake_${randomBytes(12).toString('hex')}`;
export const nowSeconds = () => Math.floor(Date.now() / 1000);

export class FakeStore {
  readonly sessions = new Map<string, FakeSession>();
  readonly paymentIntents = new Map<string, FakePaymentIntent>();
  readonly refunds = new Map<string, FakeRefund>();
  /** Idempotency keys as the service keeps them: the first answer, replayed for the same request. */
  readonly answers = new Map<string, StoredAnswer>();

  /** The session as the API returns it (without the fake's own fields). */
  static publicSession(session: FakeSession): Omit<FakeSession, 'description'> {
    const { description: _description, ...rest } = session;
    return rest;
  }
}
