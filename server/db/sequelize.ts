import { Sequelize } from 'sequelize';
import { config } from '../config';

/** How long the client waits past `statement_timeout` for a server that cancels nothing because it does not answer. */
const CLIENT_GRACE_MS = 1000;

function createSequelize(statementTimeoutMs: number | null) {
  const statementBounds = statementTimeoutMs === null ? {} : { statement_timeout: statementTimeoutMs, query_timeout: statementTimeoutMs + CLIENT_GRACE_MS };
  return new Sequelize(config.databaseUrl, {
    dialect: 'postgres',
    logging: false,
    // `acquire` bounds the whole wait for a connection (a free one from the pool or a new one), so a request
    // never waits longer than DB_CONNECT_TIMEOUT_MS for one, however many requests queue for the pool.
    pool: { max: config.dbPoolMax, min: 0, idle: 10_000, acquire: config.dbConnectTimeoutMs, evict: 1000 },
    dialectOptions: { connectionTimeoutMillis: config.dbConnectTimeoutMs, ...statementBounds },
    define: { underscored: true },
  });
}

/**
 * The one Sequelize instance. Models are initialised on it in models/index.ts.
 * Sequelize listens for errors on each pooled client itself and drops a broken one, so a
 * restarted database costs the requests of that moment (503) and nothing after it. The timeouts
 * make a request fail fast while the database is away or stuck: at most DB_CONNECT_TIMEOUT_MS for a
 * connection and DB_STATEMENT_TIMEOUT_MS for each statement.
 */
export const sequelize = createSequelize(config.dbStatementTimeoutMs);

/**
 * An instance without the statement bound, for migrations and the advisory lock that makes two starting
 * processes take turns: a schema change on a big table, or waiting for the other process, may take longer
 * than any request should. The caller closes it.
 */
export const maintenanceSequelize = () => createSequelize(null);
