/**
 * A browser-like client of a server in another process, by its address: keeps the session cookie,
 * sends the CSRF token on writes. `sameSessionOn(base)` talks to another server with this session,
 * as a load balancer sending the person's next request elsewhere would.
 */
export type RemoteClient = ReturnType<typeof remoteClient>;

export function remoteClient(base: string, shared: { cookie: string; csrf: string } = { cookie: '', csrf: '' }) {
  const state = shared;
  const send = async (method: string, path: string, body?: BodyInit | object) => {
    const isForm = body instanceof FormData;
    const res = await fetch(`${base}${path}`, {
      method,
      redirect: 'manual',
      headers: { cookie: state.cookie, ...(method === 'GET' ? {} : { 'x-csrf-token': state.csrf }), ...(body && !isForm ? { 'content-type': 'application/json' } : {}) },
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
    const set = res.headers.getSetCookie();
    if (set.length) state.cookie = set.map((c) => c.split(';')[0]).join('; ');
    const type = res.headers.get('content-type') ?? '';
    const payload = type.includes('json') ? await res.json() : Buffer.from(await res.arrayBuffer());
    const token = (payload as { csrfToken?: string; session?: { csrfToken?: string } })?.csrfToken ?? (payload as { session?: { csrfToken?: string } })?.session?.csrfToken;
    if (typeof token === 'string') state.csrf = token;
    return { status: res.status, body: payload as never, text: Buffer.isBuffer(payload) ? payload.toString('utf8') : JSON.stringify(payload), headers: res.headers };
  };
  return {
    base,
    state,
    get: (path: string) => send('GET', path),
    post: (path: string, body?: BodyInit | object) => send('POST', path, body ?? {}),
    patch: (path: string, body: object) => send('PATCH', path, body),
    async signIn(email: string, password: string) {
      await send('GET', '/api/session');
      return send('POST', '/api/session', { email, password });
    },
    sameSessionOn: (otherBase: string) => remoteClient(otherBase, state),
  };
}
