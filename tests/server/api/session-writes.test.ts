import { afterEach, describe, expect, it } from 'vitest';
import { sessionPool } from '@server/session-store';
import { config } from '@server/config';
import { signedIn } from '../../support/event-factory';

// On a show morning every write to the session table queues behind visitors: a signed-in person's
// requests only read their session, and renew it once it has less than half its life left.

const original = sessionPool.query.bind(sessionPool);
let writes: string[] = [];
sessionPool.query = ((...args: Parameters<typeof original>) => {
  const text = typeof args[0] === 'string' ? args[0] : (args[0] as { text?: string }).text ?? '';
  if (/^\s*(UPDATE|INSERT)/i.test(text)) writes.push(text);
  return original(...args);
}) as typeof sessionPool.query;
afterEach(() => {
  writes = [];
});

describe('the session of a signed-in person', () => {
  it('is read, not written, on each request, and renewed once half its life is spent', async () => {
    const judge = await signedIn({ name: 'Quiet Session' });
    writes = [];
    for (let i = 0; i < 5; i++) expect((await judge.client.get('/api/session')).status).toBe(200);
    expect(writes).toEqual([]);

    // Most of its life gone: the next request renews it, once, with a fresh cookie.
    const nearlyOver = new Date(Date.now() + config.sessionMaxAgeMs / 4).toISOString();
    await sessionPool.query(`UPDATE session SET sess = jsonb_set(sess::jsonb, '{cookie,expires}', to_jsonb($1::text))::json WHERE sess::jsonb #>> '{passport,user}' IS NOT NULL`, [nearlyOver]);
    writes = [];
    const renewed = await judge.client.get('/api/session');
    expect(String(renewed.headers['set-cookie'])).toMatch(/placard\.sid=/);
    expect(writes).toHaveLength(1);
    writes = [];
    await judge.client.get('/api/session');
    expect(writes).toEqual([]);
  });
});
