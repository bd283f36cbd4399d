import { ConnectionError } from 'sequelize';

// Node socket errors and PostgreSQL SQLSTATEs that mean "the database cannot be reached right now",
// as opposed to "this query is wrong". Class 08 is "connection exception"; 57P01–57P03 are a server
// shutting down or starting up; 53300 is too many connections; 57014 is a statement cancelled, here by
// statement_timeout: the database is too busy or stuck to answer in time (PostgreSQL's errcodes appendix).
const SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', 'EHOSTUNREACH', 'EAI_AGAIN', 'ENETUNREACH']);
const SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300', '57014']);
// pg and pg-pool say these in words only (no code).
const MESSAGES = [/connection terminated/i, /timeout exceeded when trying to connect/i, /not queryable/i, /connection.*(?:closed|ended)/i, /query read timeout/i];

/** True when an error (or what it wraps: Sequelize's `parent`/`original`, a `cause`) says the database is unreachable. */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== 'object' || depth > 4) return false;
  if (err instanceof ConnectionError) return true;
  const e = err as { code?: unknown; message?: unknown; parent?: unknown; original?: unknown; cause?: unknown };
  if (typeof e.code === 'string' && (SOCKET_CODES.has(e.code) || SQLSTATES.has(e.code) || /^08[0-9A-Z]{3}$/.test(e.code))) return true;
  if (typeof e.message === 'string' && MESSAGES.some((m) => m.test(e.message as string))) return true;
  return [e.parent, e.original, e.cause].some((inner) => inner !== err && isDatabaseUnavailable(inner, depth + 1));
}
