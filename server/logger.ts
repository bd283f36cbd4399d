import { pino } from 'pino';
import { config } from './config';

/** Never written to the log: credentials and cookies. */
export const LOG_REDACT = ['req.headers.cookie', 'req.headers.authorization', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]', '*.password', '*.newPassword', '*.currentPassword'];

export const logger = pino({ level: config.logLevel, redact: LOG_REDACT });

// Query values that are credentials: the password-reset link carries its token in ?token=.
const SECRET_PARAM = /token|password|secret/i;

/** The URL with the value of every credential-like query parameter replaced. */
export function redactUrl(url: string): string {
  const q = url.indexOf('?');
  if (q < 0) return url;
  const params = new URLSearchParams(url.slice(q + 1));
  for (const name of new Set(params.keys())) if (SECRET_PARAM.test(name)) params.set(name, '[Redacted]');
  return `${url.slice(0, q)}?${params.toString()}`;
}

type SerializedReq = { url?: string; query?: Record<string, unknown> } & Record<string, unknown>;

/** pino-http serializers: the request line and query as logged, without reset tokens. */
export const httpLogSerializers = {
  req: (req: SerializedReq) => ({
    ...req,
    ...(typeof req.url === 'string' ? { url: redactUrl(req.url) } : {}),
    ...(req.query && typeof req.query === 'object'
      ? { query: Object.fromEntries(Object.entries(req.query).map(([k, v]) => [k, SECRET_PARAM.test(k) ? '[Redacted]' : v])) }
      : {}),
  }),
};
