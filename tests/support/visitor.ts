import http from 'node:http';
import { randomInt } from 'node:crypto';

export type Answer = { status: number; headers: http.IncomingHttpHeaders; text: string };

/** A loopback address of its own (127.a.b.c), so each test's visitors count against their own rate limit. */
export const loopbackAddress = () => `127.${randomInt(1, 255)}.${randomInt(0, 256)}.${randomInt(1, 255)}`;

function send(method: string, url: string, opts: { localAddress: string; headers?: Record<string, string>; body?: string }): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = http.request(url, { method, localAddress: opts.localAddress, headers: opts.headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text: Buffer.concat(chunks).toString('utf8') }));
    });
    req.on('error', reject);
    req.end(opts.body);
  });
}

/** The vote form's token in a page, if the page has the form. */
export const formTokenIn = (html: string) => /<input type="hidden" name="token" value="([^"]+)"/.exec(html)?.[1];

/**
 * A phone without script: keeps its cookies, views public pages and posts the vote form as a browser
 * would (form-encoded, with our Origin), from its own loopback address.
 */
export function visitor(baseUrl: string, address = loopbackAddress()) {
  const cookies = new Map<string, string>();
  const keep = (a: Answer) => {
    for (const line of ([] as string[]).concat(a.headers['set-cookie'] ?? [])) {
      const [pair = ''] = line.split(';');
      const i = pair.indexOf('=');
      cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
    return a;
  };
  const cookieHeader = () => [...cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  return {
    address,
    cookies,
    view: async (code: string) => keep(await send('GET', `${baseUrl}/c/${code}`, { localAddress: address, headers: { cookie: cookieHeader(), 'accept-language': 'en-GB' } })),
    /** Posts the form; `token` undefined leaves the field out, `headers` adds or overrides (e.g. another Origin). */
    vote: async (code: string, token: string | undefined, headers: Record<string, string> = {}) =>
      keep(
        await send('POST', `${baseUrl}/c/${code}/vote`, {
          localAddress: address,
          headers: { 'content-type': 'application/x-www-form-urlencoded', origin: baseUrl, cookie: cookieHeader(), ...headers },
          body: token === undefined ? '' : new URLSearchParams({ token }).toString(),
        }),
      ),
    /** Sends the public page's question form as a browser would: form-encoded fields, from this visitor's address. */
    ask: async (code: string, fields: Record<string, string>) =>
      keep(
        await send('POST', `${baseUrl}/c/${code}/questions`, {
          localAddress: address,
          headers: { 'content-type': 'application/x-www-form-urlencoded', origin: baseUrl, cookie: cookieHeader() },
          body: new URLSearchParams(fields).toString(),
        }),
      ),
    /** Views the car's page and votes with the form it holds, as a person pressing the button would. */
    async viewAndVote(code: string) {
      const page = await this.view(code);
      return this.vote(code, formTokenIn(page.text));
    },
  };
}
export type Visitor = ReturnType<typeof visitor>;
