import session from 'express-session';
import type { RequestHandler } from 'express';
import connectPgSimple from 'connect-pg-simple';
import pg from 'pg';
import { config } from './config';
import { logger } from './logger';
import { SESSION_COOKIE } from './routes/session';

const PgStore = connectPgSimple(session);
export const sessionPool = new pg.Pool({
  connectionString: config.databaseUrl,
  max: 5,
  // The same bounds as Sequelize's pool: the wait for a connection, and each statement (server, then client).
  connectionTimeoutMillis: config.dbConnectTimeoutMs,
  statement_timeout: config.dbStatementTimeoutMs,
  query_timeout: config.dbStatementTimeoutMs + 1000,
  idleTimeoutMillis: 10_000,
});
// An idle client whose server went away (restart, killed postmaster) makes the pool emit 'error';
// with no listener Node would end the whole process. The pool drops that client and makes a new one later.
sessionPool.on('error', (err) => logger.warn({ err }, 'session store: a database connection was lost'));

/** Sessions live in PostgreSQL (table made by a migration), so any server process can serve any request. */
const sessionWithoutRenewal = session({
  name: SESSION_COOKIE,
  secret: config.sessionSecret,
  store: new PgStore({
    pool: sessionPool,
    tableName: 'session',
    createTableIfMissing: false,
    pruneSessionInterval: 15 * 60,
    errorLog: (...args: unknown[]) => logger.warn({ detail: args.map(String).join(' ') }, 'session store: pruning failed'),
    // No expiry UPDATE on every request (a write queued behind visitors): renewWhenHalfSpent renews instead.
    disableTouch: true,
  }),
  resave: false,
  saveUninitialized: false,
  rolling: false,
  cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: config.sessionMaxAgeMs, path: '/' },
});

declare module 'express-session' {
  interface SessionData {
    /** When the session's life was last renewed (renewWhenHalfSpent). */
    renewedAt?: number;
  }
}

/**
 * A session in use keeps going: once less than half its life is left, the next request renews it
 * (one write and a fresh cookie). Every other request only reads the session.
 */
const renewWhenHalfSpent: RequestHandler = (req, _res, next) => {
  const left = req.session?.cookie.maxAge;
  if (req.session && typeof left === 'number' && left < config.sessionMaxAgeMs / 2 && Object.keys(req.session).some((k) => k !== 'cookie')) {
    req.session.cookie.maxAge = config.sessionMaxAgeMs;
    req.session.renewedAt = Date.now(); // a change to the session, so express-session saves it and sends the cookie
  }
  next();
};

export const sessionMiddleware = [sessionWithoutRenewal, renewWhenHalfSpent];
