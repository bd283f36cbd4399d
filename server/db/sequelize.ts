import { Sequelize } from 'sequelize';
import { config } from '../config';

/**
 * The one Sequelize instance. Models are initialised on it in models/index.ts.
 * Sequelize listens for errors on each pooled client itself and drops a broken one, so a
 * restarted database costs the requests of that moment (503) and nothing after it. The timeouts
 * make a request fail fast while the database is away instead of waiting a minute for a connection.
 */
export const sequelize = new Sequelize(config.databaseUrl, {
  dialect: 'postgres',
  logging: false,
  // A busy but healthy database queues requests for a pooled connection (50 entrants at once); a database
  // that is down fails each connection attempt within the connect timeout, so the wait here can be long.
  pool: { max: 10, min: 0, idle: 10_000, acquire: 30_000, evict: 1000 },
  dialectOptions: { connectionTimeoutMillis: config.dbConnectTimeoutMs },
  define: { underscored: true },
});
