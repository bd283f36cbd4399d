import { sequelize } from '../../db/sequelize';

/** Whether the database answers a trivial query. */
export const databaseReachable = (): Promise<boolean> => sequelize.query('SELECT 1').then(() => true, () => false);

let draining = false;

/** A process that is stopping says so to the load balancer, which then sends it no new requests. */
export function startDraining(): void {
  draining = true;
}

/** Ready for traffic: not stopping, and the database answers. */
export const readyForTraffic = async (): Promise<boolean> => !draining && (await databaseReachable());
