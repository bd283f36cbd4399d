import express, { type Request, type Response } from 'express';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { FakeStore, newId, type FakeSession } from './store';
import { checkoutPage, notFoundPage } from './page';
import { webhookSender, type WebhookSender } from './webhooks';
import { createCheckoutSession, createRefund, apiError, type ApiAnswer } from './api';

export type FakePaymentServiceOptions = {
  port: number;
  host?: string;
  /** The product's webhook endpoint, e.g. http://127.0.0.1:3000/api/payments/webhook. */
  webhookUrl: string;
  secretKey: string;
  webhookSecret: string;
  apiVersion: string;
};

/** How the fake's API answers: as the service does, not at all (connections dropped), or never (a hang). */
export type FakeApiState = 'up' | 'down' | 'hanging';

export type FakeControl = { state: FakeApiState; refused: number };

export type FakePaymentService = {
  url: string;
  /** Test-only: set `state` to make the API calls fail or hang (the pay pages keep working); `refused` counts the calls not answered. */
  control: FakeControl;
  host: string;
  port: number;
  store: FakeStore;
  webhooks: WebhookSender;
  close(): Promise<void>;
};

/**
 * A loopback stand-in for the hosted payment service, for the demo and the tests: it answers the
 * calls Placard makes through the SDK (Checkout Session create, retrieve and expire; Refund create)
 * with the service's JSON and error shapes, honours idempotency keys, serves a plain pay / cancel
 * page at each session's URL, and posts signed webhooks to the product.
 */
export async function startFakePaymentService(options: FakePaymentServiceOptions): Promise<FakePaymentService> {
  const host = options.host ?? '127.0.0.1';
  const store = new FakeStore();
  const app = express();
  app.disable('x-powered-by');
  let base = '';
  const webhooks = webhookSender(options.webhookUrl, options.webhookSecret, options.apiVersion);

  const control: FakeControl = { state: 'up', refused: 0 };
  const api = express.Router();
  api.use((req, _res, next) => {
    // A service that is down drops the connection; one that hangs never answers (close() ends those sockets).
    if (control.state === 'up') return next();
    control.refused++;
    if (control.state === 'down') req.socket.destroy();
  });
  api.use((req, res, next) => {
    if (req.get('authorization') !== `Bearer ${options.secretKey}`) {
      res.status(401).json({ error: { type: 'invalid_request_error', message: 'Invalid API Key provided.' } });
      return;
    }
    next();
  });
  api.use(express.urlencoded({ extended: true, limit: '100kb' }));

  /** Answers once per idempotency key: the same request again gets the first answer; other parameters are refused. */
  const idempotent = (handler: (req: Request) => ApiAnswer) => (req: Request, res: Response) => {
    const key = req.get('idempotency-key');
    const fingerprint = `${req.method} ${req.path} ${JSON.stringify(req.body ?? {})}`;
    const stored = key ? store.answers.get(key) : undefined;
    if (stored) {
      if (stored.fingerprint !== fingerprint) {
        const refused = apiError(400, 'idempotency_error', 'Keys for idempotent requests can only be used with the same parameters they were first used with.');
        res.status(refused.status).json(refused.body);
        return;
      }
      res.set('Idempotent-Replayed', 'true').status(stored.status).json(stored.body);
      return;
    }
    const answer = handler(req);
    if (key) store.answers.set(key, { fingerprint, ...answer });
    res.status(answer.status).json(answer.body);
  };

  api.post('/checkout/sessions', idempotent((req) => createCheckoutSession(store, req.body as Record<string, unknown>, base)));
  api.get('/checkout/sessions/:id', (req, res) => {
    const session = store.sessions.get(String(req.params.id));
    if (!session) {
      const missing = apiError(404, 'invalid_request_error', `No such checkout.session: '${String(req.params.id)}'`, { code: 'resource_missing', param: 'id' });
      res.status(missing.status).json(missing.body);
      return;
    }
    res.json(FakeStore.publicSession(session));
  });
  api.post('/checkout/sessions/:id/expire', (req, res) => {
    const session = store.sessions.get(String(req.params.id));
    if (!session || session.status !== 'open') {
      const refused = apiError(400, 'invalid_request_error', 'Only Checkout Sessions with a status of open can be expired.');
      res.status(refused.status).json(refused.body);
      return;
    }
    expire(session);
    res.json(FakeStore.publicSession(session));
  });
  api.post('/refunds', idempotent((req) => createRefund(store, req.body as Record<string, unknown>)));
  api.use((_req, res) => {
    const missing = apiError(404, 'invalid_request_error', 'This stand-in answers only the calls Placard makes.');
    res.status(missing.status).json(missing.body);
  });
  app.use('/v1', api);

  function expire(session: FakeSession) {
    session.status = 'expired';
    session.url = null;
    void webhooks.send('checkout.session.expired', FakeStore.publicSession(session));
  }

  // The pages a payer sees at the session's URL.
  const sessionOf = (req: Request) => store.sessions.get(String(req.params.id));
  app.get('/pay/:id', (req, res) => {
    const session = sessionOf(req);
    res.set('Cache-Control', 'no-store');
    if (!session) {
      res.status(404).type('html').send(notFoundPage());
      return;
    }
    res.type('html').send(checkoutPage(session));
  });
  app.post('/pay/:id/pay', (req, res) => {
    const session = sessionOf(req);
    if (!session || session.status !== 'open') {
      res.status(session ? 409 : 404).type('html').send(session ? checkoutPage(session) : notFoundPage());
      return;
    }
    const intent = { id: newId('pi'), amount: session.amount_total, amount_refunded: 0, currency: session.currency, session: session.id };
    store.paymentIntents.set(intent.id, intent);
    Object.assign(session, { status: 'complete', payment_status: 'paid', payment_intent: intent.id, url: null });
    void webhooks.send('checkout.session.completed', FakeStore.publicSession(session));
    res.redirect(303, session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id));
  });
  app.post('/pay/:id/cancel', (req, res) => {
    const session = sessionOf(req);
    if (!session) {
      res.status(404).type('html').send(notFoundPage());
      return;
    }
    // Leaving the page does not end the session, as with the hosted page: it stays open until it expires.
    res.redirect(303, (session.cancel_url ?? session.success_url).replaceAll('{CHECKOUT_SESSION_ID}', session.id));
  });

  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(options.port, host, (err?: Error) => (err ? reject(err) : resolve(s)));
    s.once('error', reject);
  });
  const { port } = server.address() as AddressInfo;
  base = `http://${host}:${port}`;
  return {
    url: base,
    control,
    host,
    port,
    store,
    webhooks,
    async close() {
      webhooks.stop();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

