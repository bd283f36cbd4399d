import type { ErrorCode } from '@shared/errors';

/** An API error in the server's one shape; `fields` names what to fix. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | 'NETWORK',
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
  }
}

let csrfToken: string | undefined;
/** The session endpoint hands out the token; every write sends it back. */
export const setCsrfToken = (token: string | undefined) => {
  csrfToken = token;
};
/** For requests that cannot go through api(), such as an upload with progress (XMLHttpRequest). */
export const getCsrfToken = () => csrfToken;

type Options = {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** Lets the request finish after the page closes (an editor panel saved on the way out). Browsers allow 64 KB of such bodies in flight. */
  keepalive?: boolean;
};

const KEEPALIVE_MAX_BYTES = 60_000;

async function send(path: string, { method = 'GET', body, signal, keepalive }: Options): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A FormData body (a small upload with no progress bar) sets its own multipart type and boundary.
  const form = body instanceof FormData;
  if (body !== undefined && !form) headers['Content-Type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['X-CSRF-Token'] = csrfToken;
  const sent = body === undefined ? undefined : form ? body : JSON.stringify(body);
  const small = typeof sent === 'string' && sent.length < KEEPALIVE_MAX_BYTES;
  try {
    return await fetch(path, { method, headers, body: sent, credentials: 'same-origin', signal, keepalive: Boolean(keepalive && small) });
  } catch (err) {
    if ((err as Error).name === 'AbortError') throw err;
    throw new ApiError(0, 'NETWORK', 'No connection to Placard. Check your signal and try again.');
  }
}

async function toError(res: Response): Promise<ApiError> {
  // The schema (and zod with it) loads on the first error answer, not with the first screen: most
  // visits never see one, and sign-in stays light (`npm run bench`).
  const [{ ErrorResponseSchema }, body] = await Promise.all([import('@shared/errors'), res.json().catch(() => null)]);
  const parsed = ErrorResponseSchema.safeParse(body);
  if (parsed.success) return new ApiError(res.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.fields);
  return new ApiError(res.status, 'INTERNAL', `The server answered ${res.status}. Please try again.`);
}

/** Calls the JSON API. A stale CSRF token is renewed once, transparently. */
export async function api<T>(path: string, options: Options = {}): Promise<T> {
  let res = await send(path, options);
  if (res.status === 403 && options.method && options.method !== 'GET') {
    const err = await toError(res.clone());
    if (err.code === 'CSRF_INVALID') {
      const session = await send('/api/session', {});
      if (session.ok) setCsrfToken(((await session.json()) as { csrfToken: string }).csrfToken);
      res = await send(path, options);
    }
  }
  if (!res.ok) throw await toError(res);
  if (res.status === 204) return undefined as T;
  return (await res.json()) as T;
}
