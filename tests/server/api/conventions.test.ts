import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { apiClient } from '../../support/api-client';

describe('API conventions', () => {
  it('answers health with the database state', async () => {
    const res = await request(testApp()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'ok' });
  });

  it('uses one error shape for unknown endpoints and broken JSON, with no stack trace', async () => {
    const missing = await request(testApp()).get('/api/no-such-thing');
    expect(missing.status).toBe(404);
    expect(missing.body).toEqual({ error: { code: 'NOT_FOUND', message: 'No such API endpoint.' } });
    const client = await apiClient();
    const broken = await client.raw.post('/api/session').set('X-CSRF-Token', client.csrf).set('Content-Type', 'application/json').send('{"email": ');
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('BAD_REQUEST');
    expect(JSON.stringify(broken.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });

  it('sends helmet headers, no-store on the API, and a session cookie that is HttpOnly and SameSite=Lax', async () => {
    const res = await request(testApp()).get('/api/session');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['cache-control']).toBe('no-store');
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('placard.sid='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    // Served over plain http here (PUBLIC_BASE_URL is http), so not Secure.
    expect(cookie).not.toMatch(/Secure/);
  });
});

describe('session lifetimes', () => {
  const expiresInDays = (res: request.Response) => {
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('placard.sid='))!;
    const expires = /Expires=([^;]+)/.exec(cookie)![1]!;
    return (new Date(expires).getTime() - Date.now()) / (24 * 3600 * 1000);
  };

  it('keeps a visitor’s session a day and a signed-in one for SESSION_MAX_AGE_DAYS (30)', async () => {
    const { createUser } = await import('../../support/factories');
    // A visitor's first request makes the session: a cookie for a day.
    const agent = request.agent(testApp());
    const anonymous = await agent.get('/api/session');
    expect(expiresInDays(anonymous)).toBeGreaterThan(0.9);
    expect(expiresInDays(anonymous)).toBeLessThan(1.1);
    const { email, password } = await createUser();
    const signedIn = await agent.post('/api/session').set('X-CSRF-Token', anonymous.body.csrfToken).send({ email, password });
    expect(signedIn.status).toBe(200);
    expect(expiresInDays(signedIn)).toBeGreaterThan(29);
  });
});
