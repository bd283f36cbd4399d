import { describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { loadConfig, FAKE_PAYMENTS_KEY } from '@server/config';
import { paymentsClientOptions } from '@server/payments/client';

const base = { NODE_ENV: 'test', PGPORT: '54329' } as NodeJS.ProcessEnv;

describe('payments configuration', () => {
  it('uses the local fake when no key is set, reached by host, port and protocol', () => {
    const payments = loadConfig(base).payments;
    expect(payments.mode).toBe('fake');
    expect(payments.secretKey).toBe(FAKE_PAYMENTS_KEY);
    expect(paymentsClientOptions(payments, { host: '127.0.0.1', port: 41234 })).toMatchObject({ host: '127.0.0.1', port: 41234, protocol: 'http', maxNetworkRetries: 2, timeout: 4000 });
    expect(() => paymentsClientOptions(payments, undefined)).toThrow(/fake payment service is not running/);
  });

  it('switches to the hosted service with a real key and its webhook secret, with no other change', () => {
    const payments = loadConfig({ ...base, STRIPE_SECRET_KEY: 'sk_live_abc123', STRIPE_WEBHOOK_SECRET: 'whsec_real' }).payments;
    expect(payments).toMatchObject({ mode: 'hosted', secretKey: 'sk_live_abc123', webhookSecret: 'whsec_real' });
    const options = paymentsClientOptions(payments, { host: '127.0.0.1', port: 41234 }); // a running fake is ignored
    expect(options).not.toHaveProperty('host');
    expect(options).not.toHaveProperty('port');
    const client = new Stripe(payments.secretKey, options);
    expect(client.getApiField('host')).toBe('api.stripe.com');
    expect(client.getApiField('protocol')).toBe('https');
  });

  it('refuses a key without its webhook secret, and a value that is not a secret key, naming the variable', () => {
    expect(() => loadConfig({ ...base, STRIPE_SECRET_KEY: 'sk_test_abc' })).toThrow(/STRIPE_WEBHOOK_SECRET/);
    expect(() => loadConfig({ ...base, STRIPE_SECRET_KEY: 'pk_live_abc', STRIPE_WEBHOOK_SECRET: 'whsec_x' })).toThrow(/STRIPE_SECRET_KEY/);
  });

  it('refuses to start in production without a key and signing secret, unless online payment is switched off', () => {
    const production = { ...base, NODE_ENV: 'production', SESSION_SECRET: 'a-production-secret-of-length', PUBLIC_BASE_URL: 'https://shows.example.test' } as NodeJS.ProcessEnv;
    expect(() => loadConfig(production)).toThrow(/STRIPE_SECRET_KEY: required in production.*PAYMENTS_ONLINE=false/);
    expect(() => loadConfig({ ...production, STRIPE_SECRET_KEY: 'sk_live_abc' })).toThrow(/STRIPE_WEBHOOK_SECRET/);
    expect(loadConfig({ ...production, STRIPE_SECRET_KEY: 'sk_live_abc', STRIPE_WEBHOOK_SECRET: 'whsec_real' }).payments.mode).toBe('hosted');
    const off = loadConfig({ ...production, PAYMENTS_ONLINE: 'false' }).payments;
    expect(off.mode).toBe('off');
    expect(() => paymentsClientOptions(off, { host: '127.0.0.1', port: 41234 })).toThrow(/switched off/);
  });

  it('gives the fake a new random signing secret on every start, so no secret in the source signs a webhook', () => {
    const first = loadConfig(base).payments.webhookSecret;
    const second = loadConfig(base).payments.webhookSecret;
    expect(first).toMatch(/^whsec_fake_[0-9a-f]{48}$/);
    expect(second).not.toBe(first);
  });

  it('bounds every SDK call by PAYMENTS_TIMEOUT_MS and PAYMENTS_NETWORK_RETRIES, for the fake and the hosted service alike', () => {
    const env = { ...base, PAYMENTS_TIMEOUT_MS: '750', PAYMENTS_NETWORK_RETRIES: '1' };
    expect(paymentsClientOptions(loadConfig(env).payments, { host: '127.0.0.1', port: 41234 })).toMatchObject({ timeout: 750, maxNetworkRetries: 1 });
    expect(paymentsClientOptions(loadConfig({ ...env, STRIPE_SECRET_KEY: 'sk_test_a', STRIPE_WEBHOOK_SECRET: 'whsec_b' }).payments)).toMatchObject({ timeout: 750, maxNetworkRetries: 1 });
    expect(() => loadConfig({ ...base, PAYMENTS_TIMEOUT_MS: '0' })).toThrow(/PAYMENTS_TIMEOUT_MS/);
  });
});
