import type { Server } from 'node:http';
import { createApp } from './app';
import { config } from './config';
import { logger } from './logger';
import { sequelize } from './db/sequelize';
import { sessionPool } from './session-store';
import { stopJobQueue } from './jobs/queue';

/** Listens on the configured address; resolves once the port is open. */
export function listen(port = config.port, host = config.host): Promise<Server> {
  const app = createApp();
  return new Promise((resolve, reject) => {
    const server = app.listen(port, host, (err?: Error) => (err ? reject(err) : resolve(server)));
  });
}

export async function closeConnections(): Promise<void> {
  await stopJobQueue(); // first: a job in progress finishes while the database is still open
  await Promise.allSettled([sequelize.close(), sessionPool.end()]);
}

export { logger };
