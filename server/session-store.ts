import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import pg from 'pg';
import { config } from './config';
import { SESSION_COOKIE } from './routes/session';

const PgStore = connectPgSimple(session);
export const sessionPool = new pg.Pool({ connectionString: config.databaseUrl, max: 5 });

/** Sessions live in PostgreSQL (table made by a migration), so any server process can serve any request. */
export const sessionMiddleware = session({
  name: SESSION_COOKIE,
  secret: config.sessionSecret,
  store: new PgStore({ pool: sessionPool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
  resave: false,
  saveUninitialized: false,
  rolling: true,
  cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: config.sessionMaxAgeMs, path: '/' },
});
