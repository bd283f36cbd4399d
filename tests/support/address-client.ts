import http from 'node:http';
import { loopbackAddress } from './visitor';

export type JsonAnswer = { status: number; body: { error?: { code: string; message: string; fields?: Record<string, string> } } & Record<string, unknown> };

/**
 * A JSON API client from a loopback address of its own (127.a.b.c) against a listening app, keeping its
 * cookies and CSRF token like the browser client: for per-address limits, which every supertest client shares.
 */
export function addressClient(baseUrl: string, address = loopbackAddress()) {
  const cookies = new Map<string, string>();
  let csrf = '';
  const send = (method: string, path: string, body?: object) =>
    new Promise<JsonAnswer>((resolve, reject) => {
      const headers: Record<string, string> = { cookie: [...cookies].map(([k, v]) => `${k}=${v}`).join('; '), 'x-csrf-token': csrf };
      if (body) headers['content-type'] = 'application/json';
      const req = http.request(`${baseUrl}${path}`, { method, localAddress: address, headers }, (res) => {
        for (const line of ([] as string[]).concat(res.headers['set-cookie'] ?? [])) {
          const [pair = ''] = line.split(';');
          const i = pair.indexOf('=');
          cookies.set(pair.slice(0, i), pair.slice(i + 1));
        }
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => {
          const text = Buffer.concat(chunks).toString('utf8');
          const parsed = (text ? JSON.parse(text) : {}) as JsonAnswer['body'];
          const token = (parsed as { csrfToken?: unknown; session?: { csrfToken?: unknown } }).csrfToken ?? (parsed as { session?: { csrfToken?: unknown } }).session?.csrfToken;
          if (typeof token === 'string') csrf = token;
          resolve({ status: res.statusCode ?? 0, body: parsed });
        });
      });
      req.on('error', reject);
      req.end(body ? JSON.stringify(body) : undefined);
    });
  return {
    address,
    /** Fetches the session's CSRF token first, as the browser client does. */
    start: () => send('GET', '/api/session'),
    get: (path: string) => send('GET', path),
    post: (path: string, body: object = {}) => send('POST', path, body),
    signIn: (email: string, password: string) => send('POST', '/api/session', { email, password }),
  };
}
