import { Sequelize } from 'sequelize';
import { config } from '../config';

/** The one Sequelize instance. Models are initialised on it in models/index.ts. */
export const sequelize = new Sequelize(config.databaseUrl, {
  dialect: 'postgres',
  logging: false,
  pool: { max: 10, min: 0, idle: 10_000 },
  define: { underscored: true },
});
