import { createHmac } from 'node:crypto';
import { newId, nowSeconds } from './store';

/**
 * The `Stripe-Signature` header as the hosted service writes it: `t=<unix seconds>,v1=<hex>`, where
 * the hex is HMAC-SHA256 with the endpoint's signing secret over `<t>.<raw JSON body>`.
 */
export function signPayload(payload: string, secret: string, timestamp = nowSeconds()): string {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

export type Delivery = { eventId: string; type: string; payload: string; signature: string; status: number | 'failed'; attempt: number };

export type WebhookSender = {
  /** Every attempt, in order (tests replay one, or look at what was sent). */
  readonly deliveries: Delivery[];
  send(type: string, object: object): Promise<void>;
  /** Resolves when no delivery is waiting for a retry. */
  idle(): Promise<void>;
  stop(): void;
};

const RETRY_DELAYS_MS = [500, 1000, 2000, 4000, 8000];

/** Posts events to the product's endpoint, retrying with backoff on anything but a 2xx, as the service does. */
export function webhookSender(url: string, secret: string, apiVersion: string): WebhookSender {
  const deliveries: Delivery[] = [];
  const pending = new Set<Promise<void>>();
  let stopped = false;

  async function deliver(eventId: string, type: string, payload: string) {
    for (let attempt = 1; attempt <= RETRY_DELAYS_MS.length + 1 && !stopped; attempt++) {
      const signature = signPayload(payload, secret);
      let status: number | 'failed';
      try {
        const res = await fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/json; charset=utf-8', 'Stripe-Signature': signature }, body: payload });
        status = res.status;
        await res.arrayBuffer();
      } catch {
        status = 'failed';
      }
      deliveries.push({ eventId, type, payload, signature, status, attempt });
      if (typeof status === 'number' && status >= 200 && status < 300) return;
      const wait = RETRY_DELAYS_MS[attempt - 1];
      if (wait === undefined) return;
      await new Promise((r) => setTimeout(r, wait).unref());
    }
  }

  return {
    deliveries,
    async send(type, object) {
      const event = {
        id: newId('evt'),
        object: 'event',
        api_version: apiVersion,
        created: nowSeconds(),
        data: { object },
        livemode: false,
        pending_webhooks: 1,
        request: { id: null, idempotency_key: null },
        type,
      };
      const job = deliver(event.id, type, JSON.stringify(event, null, 2));
      pending.add(job);
      void job.finally(() => pending.delete(job));
    },
    async idle() {
      while (pending.size) await Promise.allSettled([...pending]);
    },
    stop() {
      stopped = true;
    },
  };
}
