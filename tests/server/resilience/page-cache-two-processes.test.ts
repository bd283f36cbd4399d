import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { forkServer, type ForkedServer } from '../../support/forked-server';

// Two web processes on one database, as `npm start -- --web-processes 2` runs them behind one port:
// a change made through one reaches the other's cached public page within a second.

let one: ForkedServer;
let two: ForkedServer;

beforeAll(async () => {
  [one, two] = await Promise.all([forkServer({}), forkServer({})]);
});
afterAll(async () => {
  await Promise.all([one?.stop(), two?.stop()]);
});

/** A signed-in owner's client on one server: the session cookie and the CSRF token it needs. */
async function signedInOn(server: ForkedServer) {
  let cookie = '';
  let csrf = '';
  const call = async (method: string, url: string, body?: unknown) => {
    const res = await fetch(server.base + url, {
      method,
      headers: { cookie, 'x-csrf-token': csrf, ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const setCookie = res.headers.get('set-cookie');
    if (setCookie?.startsWith('placard.sid=')) cookie = setCookie.split(';')[0]!;
    return { status: res.status, json: (await res.json()) as Record<string, unknown> };
  };
  csrf = (await call('GET', '/api/session')).json.csrfToken as string;
  const signIn = await call('POST', '/api/session', { email: server.email, password: server.password });
  expect(signIn.status).toBe(200);
  csrf = signIn.json.csrfToken as string;
  return call;
}

const pageText = async (server: ForkedServer, path: string) => (await fetch(server.base + path, { headers: { 'accept-encoding': 'gzip' } })).text();

describe('the public page cache across processes', () => {
  it('a build edited through one process shows on the other’s cached page within a second', async () => {
    const path = `/c/${two.code}`;
    const before = await pageText(one, path);
    expect(before).toContain('<!doctype html>');
    expect(before).not.toContain('Edited elsewhere');
    expect(await pageText(one, path)).toBe(before); // cached on the first process

    const owner = await signedInOn(two);
    const edit = await owner('PATCH', `/api/builds/${two.buildId}`, { title: 'Edited elsewhere' });
    expect(edit.status).toBe(200);
    const changedAt = Date.now();
    await expect.poll(() => pageText(one, path), { timeout: 1000, interval: 25 }).toContain('Edited elsewhere');
    expect(Date.now() - changedAt).toBeLessThan(1000);
  });
});
