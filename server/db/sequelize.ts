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
  pool: { max: 10, min: 0, idle: 10_000, acquire: config.dbConnectTimeoutMs + 2000, evict: 1000 },
  dialectOptions: { connectionTimeoutMillis: config.dbConnectTimeoutMs },
  define: { underscored: true },
});
