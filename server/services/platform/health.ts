import { sequelize } from '../../db/sequelize';

/** Whether the database answers a trivial query. */
export const databaseReachable = (): Promise<boolean> => sequelize.query('SELECT 1').then(() => true, () => false);
