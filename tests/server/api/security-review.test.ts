import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { Writable } from 'node:stream';
import express from 'express';
import { pino, type Logger } from 'pino';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { LOG_REDACT } from '@server/logger';
import { requestLog } from '@server/middlewares/request-log';
import { CARD_RENDER_LIMIT, PHOTO_UPLOAD_LIMIT } from '@server/middlewares/rate-limits';
import { Photo } from '@server/models/photo';
import { apiClient, testApp } from '../../support/api-client';
import { createUser, uniqueEmail } from '../../support/factories';
import { createBuild, createFullBuild } from '../../support/build-factory';

async function signedInOwner() {
  const { user, email, password } = await createUser();
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { user, client };
}

describe('malformed requests are answered as the client’s mistake, never as a 500', () => {
  it('answers a broken percent-encoding, a missing asset and an unknown charset with 4xx', async () => {
    for (const path of ['/c/%E0%A4%A', '/media/%E0%A4%A', '/api/public/builds/%E0%A4%A']) {
      const res = await request(testApp()).get(path);
      expect(res.status, path).toBe(400);
      expect(res.body.error.code, path).toBe('BAD_REQUEST');
    }
    const asset = await request(testApp()).get('/assets/no-such-file-anywhere.js');
    expect(asset.status).toBe(404);
    const client = await apiClient();
    const charset = await client.raw.post('/api/session').set('X-CSRF-Token', client.csrf).set('Content-Type', 'application/json; charset=latin9').send('{}');
    expect(charset.status).toBe(415);
    expect(charset.body.error.code).toBe('UNSUPPORTED_MEDIA_TYPE');
  });

  it('keeps an over-long e-mail out of the rate-limit keys (400, not a database error)', async () => {
    const client = await apiClient();
    const email = `${'a'.repeat(400)}@example.test`;
    const res = await client.post('/api/session', { email, password: 'whatever it is' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.email).toBeDefined();
    // The counters never hold an e-mail in clear.
    const rows = await sequelize.query<{ key: string }>(`SELECT key FROM rate_limit_hits WHERE key LIKE '%example.test%'`, { type: QueryTypes.SELECT });
    expect(rows).toEqual([]);
  });

  it('bounds the current password like every other password field', async () => {
    const { client } = await signedInOwner();
    const res = await client.post('/api/account/password', { currentPassword: 'x'.repeat(5000), newPassword: 'a perfectly fine one' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.currentPassword).toMatch(/at most/);
  });
});

describe('the request log', () => {
  const logTo = (level: 'info' | 'warn') => {
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk: Buffer, _enc, done) {
        lines.push(chunk.toString());
        done();
      },
    });
    const app = express();
    app.use(requestLog(pino({ level, redact: LOG_REDACT }, sink)));
    app.get('/reset-password', (_req, res) => res.send('ok'));
    app.get('/broken', (req, res) => {
      (req as typeof req & { log: Logger }).log.error('something broke'); // as the error handler logs
      res.status(500).send('no');
    });
    return { app, log: () => lines.join('') };
  };

  it('never writes a password-reset token (or any query value named token) to the log', async () => {
    const { app, log } = logTo('info');
    await request(app).get('/reset-password?token=SECRETTOKENVALUE123456&units=metric').set('Cookie', 'placard.sid=COOKIEVALUE').expect(200);
    expect(log()).toContain('/reset-password');
    expect(log()).not.toMatch(/SECRETTOKENVALUE123456|COOKIEVALUE/);
  });

  it('above info writes no request lines, yet an error logged for a request names it, token and cookie left out', async () => {
    const { app, log } = logTo('warn');
    await request(app).get('/reset-password?token=SECRETTOKENVALUE123456').expect(200);
    expect(log()).toBe('');
    await request(app).get('/broken?token=SECRETTOKENVALUE123456&units=metric').set('Cookie', 'placard.sid=COOKIEVALUE').expect(500);
    const line = JSON.parse(log()) as { msg: string; req: { method: string; url: string; headers: { cookie: string } } };
    expect(line.msg).toBe('something broke');
    expect(line.req.method).toBe('GET');
    expect(line.req.url).toMatch(/^\/broken\?token=%5BRedacted%5D&units=metric$/);
    expect(line.req.headers.cookie).toBe('[Redacted]');
  });
});

describe('dyno sheet photo', () => {
  it('must be one of the build’s own photos', async () => {
    const { user, client } = await signedInOwner();
    const mine = await createBuild(user.id);
    const other = await createUser();
    const theirs = await createBuild(other.user.id);
    const foreign = await Photo.create({ buildId: theirs.id, storageKey: 'f'.repeat(32), caption: '', position: 0, isCover: true, width: 10, height: 10, variants: [{ width: 10, height: 10 }] });
    const run = { date: '2026-05-30', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 400, peakPowerRpm: 6000, peakTorque: 380, peakTorqueRpm: 4500 };
    const res = await client.post(`/api/builds/${mine.id}/dyno-runs`, { ...run, sheetPhotoId: foreign.id });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sheetPhotoId).toMatch(/not one of this build/);
    const ok = await client.post(`/api/builds/${mine.id}/dyno-runs`, run);
    expect(ok.status).toBe(201);
  });
});

describe('rate limits on expensive and abusable endpoints', () => {
  it('limits card PDF rendering per person', async () => {
    const { user, client } = await signedInOwner();
    const build = await createFullBuild(user.id);
    // Refused queries count too (the limiter runs first), which keeps this test quick.
    for (let i = 0; i < CARD_RENDER_LIMIT.limit; i++) {
      const res = await client.get(`/api/builds/${build.id}/card.pdf?design=not-a-design`);
      expect(res.status).toBe(400);
    }
    const limited = await client.get(`/api/builds/${build.id}/card.pdf`);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('RATE_LIMITED');
    // Another person is not slowed down by the first one.
    const second = await signedInOwner();
    const theirs = await createFullBuild(second.user.id);
    expect((await second.client.get(`/api/builds/${theirs.id}/card.pdf?design=not-a-design`)).status).toBe(400);
  });

  it('limits photo uploads per person', async () => {
    const { user, client } = await signedInOwner();
    const build = await createBuild(user.id);
    for (let i = 0; i < PHOTO_UPLOAD_LIMIT.limit; i++) {
      const res = await client.raw.post(`/api/builds/${build.id}/photos`).set('X-CSRF-Token', client.csrf);
      expect(res.status).toBe(400);
    }
    const limited = await client.raw.post(`/api/builds/${build.id}/photos`).set('X-CSRF-Token', client.csrf);
    expect(limited.status).toBe(429);
  });

  it('meters sign-in and sign-up per address whatever the e-mail, reset confirmations, and the public JSON', async () => {
    const policies = (res: request.Response) => ([] as string[]).concat(res.headers['ratelimit-policy'] ?? []).join(',');
    const client = await apiClient();
    const signIn = await client.post('/api/session', { email: uniqueEmail('nobody'), password: 'not the password' });
    expect(signIn.status).toBe(401);
    expect(policies(signIn)).toContain('"signin-address"');
    const signUp = await client.post('/api/users', { email: uniqueEmail('newcomer'), name: 'New Person', password: 'long enough password' });
    expect(signUp.status).toBe(202);
    expect(policies(signUp)).toContain('"signup-address"');
    const confirm = await (await apiClient()).post('/api/password-resets/confirm', { token: 'x'.repeat(43), password: 'long enough password' });
    expect(confirm.status).toBe(400);
    expect(policies(confirm)).toContain('"reset-confirm"');
    const pub = await request(testApp()).get('/api/public/builds/ZZZZZZZ');
    expect(pub.status).toBe(404);
    expect(policies(pub)).toContain('"api"');
  });
});
