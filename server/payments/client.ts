import Stripe from 'stripe';
import { config, type Config } from '../config';

export type FakeAddress = { host: string; port: number };

let fakeAddress: FakeAddress | undefined;
let client: Stripe | undefined;

/** Points the SDK at the local fake once it listens (npm start and the tests start it). */
export function pointPaymentsAtFake(address: FakeAddress | undefined): void {
  fakeAddress = address;
  client = undefined;
}

/** The next call makes a new client from config (a test that lowers the timeout calls this). */
export function resetPaymentsClient(): void {
  client = undefined;
}

/**
 * The SDK's options: with a real key, the hosted service as the SDK knows it; without one, the fake
 * on loopback, by host, port and protocol. Nothing else in the product knows which it is. Every call
 * waits at most `timeoutMs` and is tried again `networkRetries` times by the SDK itself (safe: every
 * write carries an idempotency key), so an entrant never waits long on a service that hangs.
 */
export function paymentsClientOptions(payments: Config['payments'] = config.payments, fake: FakeAddress | undefined = fakeAddress): Stripe.StripeConfig {
  const common = { telemetry: false, timeout: payments.timeoutMs, maxNetworkRetries: payments.networkRetries } as const;
  if (payments.mode === 'off') throw new Error('Payments: online payment is switched off (PAYMENTS_ONLINE=false).');
  if (payments.mode === 'hosted') return common;
  if (!fake) throw new Error('Payments: no STRIPE_SECRET_KEY is set and the local fake payment service is not running.');
  return { ...common, host: fake.host, port: fake.port, protocol: 'http' };
}

export function paymentsClient(): Stripe {
  client ??= new Stripe(config.payments.secretKey, paymentsClientOptions());
  return client;
}

/** Signatures older than this, or stamped further ahead than this, are refused (the SDK's own default, 300 s). */
export const SIGNATURE_TOLERANCE_SECONDS = Stripe.webhooks.DEFAULT_TOLERANCE;

/**
 * Webhook signatures are checked offline, with the signing secret of the endpoint. The SDK refuses
 * a stamp older than the tolerance but not one from the future, so the future side is checked here.
 */
export function verifyWebhook(rawBody: Buffer, signature: string, secret = config.payments.webhookSecret, now = Date.now()): Stripe.Event {
  const event = Stripe.webhooks.constructEvent(rawBody, signature, secret, SIGNATURE_TOLERANCE_SECONDS, undefined, now);
  const stamp = Number(/(?:^|,)t=(\d+)/.exec(signature)?.[1]);
  if (!Number.isFinite(stamp) || stamp - Math.floor(now / 1000) > SIGNATURE_TOLERANCE_SECONDS) throw new Error('Timestamp outside the tolerance zone');
  return event;
}
