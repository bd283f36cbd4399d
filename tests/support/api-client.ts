import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '@server/app';

let app: Express | undefined;
export const testApp = () => (app ??= createApp());

/**
 * A browser-like API client: keeps cookies, fetches the CSRF token the way the client does,
 * and sends it on every write. `raw` is the underlying supertest agent for tests that misbehave on purpose.
 */
export async function apiClient() {
  const raw = request.agent(testApp());
  let csrf = '';
  const refresh = async () => {
    const res = await raw.get('/api/session').expect(200);
    csrf = res.body.csrfToken;
    return res;
  };
  await refresh();
  const keepToken = (res: request.Response) => {
    // As the browser client does: a new session (sign-in, a confirmation that signs in) brings a new token.
    const token: unknown = res.body?.csrfToken ?? res.body?.session?.csrfToken;
    if (typeof token === 'string') csrf = token;
    return res;
  };
  return {
    raw,
    get csrf() {
      return csrf;
    },
    refresh,
    get: (path: string) => raw.get(path),
    post: async (path: string, body?: object) => keepToken(await raw.post(path).set('X-CSRF-Token', csrf).send(body ?? {})),
    patch: async (path: string, body?: object) => keepToken(await raw.patch(path).set('X-CSRF-Token', csrf).send(body ?? {})),
    put: async (path: string, body?: object) => keepToken(await raw.put(path).set('X-CSRF-Token', csrf).send(body ?? {})),
    delete: async (path: string) => keepToken(await raw.delete(path).set('X-CSRF-Token', csrf)),
    signIn: async (email: string, password: string) => keepToken(await raw.post('/api/session').set('X-CSRF-Token', csrf).send({ email, password })),
  };
}
export type ApiClient = Awaited<ReturnType<typeof apiClient>>;

/** The session cookie's value from a response, for tests that follow the session id itself. */
export function sessionCookie(res: request.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith('placard.sid='))?.split(';')[0];
}
