import { describe, expect, it } from 'vitest';
import { createHmac } from 'node:crypto';
import type { Request, Response } from 'express';
import { config } from '@server/config';
import { visitorTurns, visitorsWaiting } from '@server/middlewares/visitor-turns';

// The scheduling itself, driven with plain request objects: which requests start at once, and how many
// visitors start per turn of the event loop. (The whole app runs through it in every API and page test.)
const signed = (sid: string, secret = config.sessionSecret) => `s:${sid}.${createHmac('sha256', secret).update(sid).digest('base64').replace(/=+$/, '')}`;
const request = (path: string, cookie?: string) => ({ path, headers: cookie ? { cookie } : {} }) as unknown as Request;
const response = () => {
  const headers: Record<string, string> = {};
  return { headers, res: { set: (k: string, v: string) => void (headers[k] = v) } as unknown as Response };
};
const nextTurn = () => new Promise<void>((r) => setImmediate(r));

describe('visitors take turns; signed-in work does not wait', () => {
  it('starts a signed-in API request at once, while visitors start a few per turn of the event loop', async () => {
    const started: string[] = [];
    for (let i = 0; i < 10; i++) visitorTurns(request(`/e/show-${i}`), response().res, () => started.push(`visitor ${i}`));
    visitorTurns(request('/api/events/1/scores', `theme=dark; placard.sid=${encodeURIComponent(signed('abc123'))}`), response().res, () => started.push('judge'));
    expect(started).toEqual(['judge']);
    expect(visitorsWaiting()).toBe(10);
    await nextTurn();
    expect(started).toHaveLength(1 + config.visitorRequestsPerTurn);
    await expect.poll(() => started.length).toBe(11);
    expect(started.slice(1)).toEqual(Array.from({ length: 10 }, (_, i) => `visitor ${i}`)); // in the order they came
    expect(visitorsWaiting()).toBe(0);
  });

  it('starts the judges’ and the gate’s pages at once for a signed-in person, not for a visitor', async () => {
    const started: string[] = [];
    const session = `placard.sid=${encodeURIComponent(signed('abc123'))}`;
    visitorTurns(request('/e/show'), response().res, () => started.push('visitor'));
    visitorTurns(request('/gate/7'), response().res, () => started.push('gate, no session'));
    visitorTurns(request('/judge/7', session), response().res, () => started.push('judge'));
    visitorTurns(request('/gate/7', session), response().res, () => started.push('gate'));
    visitorTurns(request('/gatehouse', session), response().res, () => started.push('another page'));
    expect(started).toEqual(['judge', 'gate']);
    await expect.poll(() => started.length).toBe(5);
  });

  it('gives no priority to a made-up or foreign session cookie, to the public JSON, or to a page', async () => {
    const cases = [
      request('/api/events/1/scores', 'placard.sid=s%3Aabc123.forged'),
      request('/api/events/1/scores', `placard.sid=${encodeURIComponent(signed('abc123', 'another-servers-secret-value'))}`),
      request('/api/events/1/scores', `xplacard.sid=${encodeURIComponent(signed('abc123'))}`),
      request('/api/public/builds/ABC', `placard.sid=${encodeURIComponent(signed('abc123'))}`),
      request('/c/ABC', `placard.sid=${encodeURIComponent(signed('abc123'))}`),
    ];
    let started = 0;
    for (const req of cases) visitorTurns(req, response().res, () => started++);
    expect(started).toBe(0);
    await expect.poll(() => started).toBe(cases.length);
  });

  it('lets health and readiness probes through at once', () => {
    let started = 0;
    visitorTurns(request('/api/health'), response().res, () => started++);
    visitorTurns(request('/api/ready'), response().res, () => started++);
    expect(started).toBe(2);
  });

  it('answers 503 with Retry-After, not a longer queue, once the queue is full', async () => {
    const max = config.visitorQueueMax;
    let started = 0;
    for (let i = 0; i < max; i++) visitorTurns(request('/'), response().res, () => started++);
    const { headers, res } = response();
    let refusal: unknown;
    visitorTurns(request('/'), res, (err?: unknown) => (refusal = err));
    expect(refusal).toMatchObject({ status: 503, code: 'UNAVAILABLE' });
    expect(headers['Retry-After']).toBe('5');
    await expect.poll(() => started, { timeout: 10_000 }).toBe(max);
  });
});
