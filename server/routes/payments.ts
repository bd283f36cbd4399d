import express, { Router } from 'express';
import { processPaymentWebhook } from '../payments/webhook';

export const paymentsWebhookRouter = Router();

/**
 * The payment service's webhook: the raw bytes (the signature covers them exactly), no session and
 * no CSRF token (the signature is the proof). Mounted before the JSON parser.
 */
paymentsWebhookRouter.post('/payments/webhook', express.raw({ type: () => true, limit: '1mb' }), async (req, res) => {
  const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
  const result = await processPaymentWebhook(body, req.get('stripe-signature'));
  res.json({ received: true, duplicate: result.duplicate });
});
