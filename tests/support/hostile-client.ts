import http from 'node:http';
import { loopbackAddress } from './visitor';

// Raw requests to the in-process app listening on loopback: any bytes, any content type, each from
// a loopback address of its own, so per-address limits (sign-in, resets, the API limit) count each
// hostile request on its own and validation, not a 429, answers it.

export type RawAnswer = { status: number; contentType: string; text: string; json: unknown };

/** A caller: its cookies and CSRF token, kept as the browser client keeps them. */
export type Caller = { name: string; cookies: Map<string, string>; csrf: string };

export function rawRequest(
  baseUrl: string,
  opts: { method: string; path: string; caller?: Caller; headers?: Record<string, string>; body?: string | Buffer },
): Promise<RawAnswer> {
  const headers: Record<string, string> = { ...opts.headers };
  if (opts.caller) {
    headers.cookie = [...opts.caller.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
    headers['x-csrf-token'] = opts.caller.csrf;
  }
  if (opts.body !== undefined) headers['content-length'] = String(Buffer.byteLength(opts.body));
  return new Promise((resolve, reject) => {
    const req = http.request(`${baseUrl}${opts.path}`, { method: opts.method, headers, localAddress: loopbackAddress(), agent: false }, (res) => {
      if (opts.caller) {
        for (const line of ([] as string[]).concat(res.headers['set-cookie'] ?? [])) {
          const [pair = ''] = line.split(';');
          const i = pair.indexOf('=');
          opts.caller.cookies.set(pair.slice(0, i), pair.slice(i + 1));
        }
      }
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => {
        const text = Buffer.concat(chunks).toString('utf8');
        const contentType = String(res.headers['content-type'] ?? '');
        let json: unknown = undefined;
        if (contentType.includes('json') && text) json = JSON.parse(text);
        resolve({ status: res.statusCode ?? 0, contentType, text, json });
      });
    });
    req.on('error', reject);
    req.end(opts.body);
  });
}

const tokenIn = (json: unknown): string | undefined => {
  const body = json as { csrfToken?: unknown; session?: { csrfToken?: unknown } } | undefined;
  const token = body?.csrfToken ?? body?.session?.csrfToken;
  return typeof token === 'string' ? token : undefined;
};

/** A visitor with a session and its CSRF token, signed in when given an e-mail and password. */
export async function caller(baseUrl: string, name: string, signIn?: { email: string; password: string }): Promise<Caller> {
  const c: Caller = { name, cookies: new Map(), csrf: '' };
  const session = await rawRequest(baseUrl, { method: 'GET', path: '/api/session', caller: c });
  c.csrf = tokenIn(session.json) ?? '';
  if (signIn) {
    const res = await rawRequest(baseUrl, { method: 'POST', path: '/api/session', caller: c, headers: { 'content-type': 'application/json' }, body: JSON.stringify(signIn) });
    if (res.status !== 200) throw new Error(`${name} could not sign in: ${res.status} ${res.text}`);
    c.csrf = tokenIn(res.json) ?? c.csrf;
  }
  return c;
}
