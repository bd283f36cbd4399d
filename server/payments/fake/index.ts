import Stripe from 'stripe';
import { config } from '../../config';
import { pointPaymentsAtFake } from '../client';
import { startFakePaymentService, type FakePaymentService } from './server';

/**
 * Starts the fake for this process's product (npm start, tests) with the configured secrets and
 * points the SDK at it. `webhookUrl` is where the product listens.
 */
export async function startLocalPayments(options: { port: number; webhookUrl: string }): Promise<FakePaymentService> {
  const fake = await startFakePaymentService({
    port: options.port,
    webhookUrl: options.webhookUrl,
    secretKey: config.payments.secretKey,
    webhookSecret: config.payments.webhookSecret,
    apiVersion: Stripe.API_VERSION,
  });
  pointPaymentsAtFake({ host: fake.host, port: fake.port });
  return fake;
}

export type { FakePaymentService };
