import { afterAll, beforeAll } from 'vitest';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { FakePaymentService } from '@server/payments/fake';

/**
 * For a test file that pays: the real server on a free port (webhooks arrive over HTTP, as in
 * production) and the fake payment service posting to it, with the SDK pointed at the fake.
 * `refunds` also works the refund queue in this file's process (its SDK knows this fake); only one
 * test file at a time should ask for it, or another file's worker takes jobs its fake never saw.
 */
export function useFakePayments(opts: { refunds?: boolean } = {}): { fake: FakePaymentService; server: Server; baseUrl: string } {
  const env = {} as { fake: FakePaymentService; server: Server; baseUrl: string };
  beforeAll(async () => {
    const { listen } = await import('@server/index');
    const { startLocalPayments } = await import('@server/payments/fake');
    env.server = await listen(0, '127.0.0.1');
    env.baseUrl = `http://127.0.0.1:${(env.server.address() as AddressInfo).port}`;
    env.fake = await startLocalPayments({ port: 0, webhookUrl: `${env.baseUrl}/api/payments/webhook` });
    if (opts.refunds) await (await import('@server/jobs/refund-entry')).startRefundWorker();
  });
  afterAll(async () => {
    await env.fake?.close();
    await new Promise((r) => env.server?.close(r));
  });
  return env;
}
