import session from 'express-session';
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
export const sessionMiddleware = session({
  name: SESSION_COOKIE,
  secret: config.sessionSecret,
  store: new PgStore({
    pool: sessionPool,
    tableName: 'session',
    createTableIfMissing: false,
    pruneSessionInterval: 15 * 60,
    errorLog: (...args: unknown[]) => logger.warn({ detail: args.map(String).join(' ') }, 'session store: pruning failed'),
  }),
  resave: false,
  saveUninitialized: false,
  rolling: true,
  cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: config.sessionMaxAgeMs, path: '/' },
});
