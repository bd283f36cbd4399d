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

/**
 * The SDK's options: with a real key, the hosted service as the SDK knows it; without one, the fake
 * on loopback, by host, port and protocol. Nothing else in the product knows which it is.
 */
export function paymentsClientOptions(payments: Config['payments'] = config.payments, fake: FakeAddress | undefined = fakeAddress): Stripe.StripeConfig {
  // The SDK retries network failures itself, safely, because every write carries an idempotency key.
  const common = { telemetry: false, timeout: 20_000 } as const;
  if (payments.mode === 'hosted') return { ...common, maxNetworkRetries: 2 };
  if (!fake) throw new Error('Payments: no STRIPE_SECRET_KEY is set and the local fake payment service is not running.');
  return { ...common, maxNetworkRetries: 0, host: fake.host, port: fake.port, protocol: 'http' };
}

export function paymentsClient(): Stripe {
  client ??= new Stripe(config.payments.secretKey, paymentsClientOptions());
  return client;
}

/** Webhook signatures are checked offline, with the signing secret of the endpoint. */
export function verifyWebhook(rawBody: Buffer, signature: string, secret = config.payments.webhookSecret): Stripe.Event {
  return Stripe.webhooks.constructEvent(rawBody, signature, secret);
}
