import type { Server } from 'node:http';
import { createApp } from './app';
import { config } from './config';
import { logger } from './logger';
import { sequelize } from './db/sequelize';
import { sessionPool } from './session-store';
import { stopJobQueue } from './jobs/queue';
import { pageChangeHandlers } from './pages/page-listener';
import { publicPageCache } from './pages/page-cache';
import { ChannelListener } from './db/channel-listener';
import { boundHeapGrowth } from './heap-growth';

/** This process's ear for committed changes to what public pages show (one LISTEN connection). */
const pageChanges = new ChannelListener({ connectionString: config.databaseUrl, ...pageChangeHandlers(publicPageCache) });

/** Listens on the configured address; resolves once the port is open. */
export async function listen(port = config.port, host = config.host): Promise<Server> {
  boundHeapGrowth();
  const app = createApp();
  // Before the first visitor: until it listens, cached pages are trusted for a second only.
  await pageChanges.start();
  return new Promise((resolve, reject) => {
    const server = app.listen(port, host, (err?: Error) => (err ? reject(err) : resolve(server)));
  });
}

export async function closeConnections(): Promise<void> {
  await stopJobQueue(); // first: a job in progress finishes while the database is still open
  await pageChanges.stop();
  publicPageCache.listening = false;
  await Promise.allSettled([sequelize.close(), sessionPool.end()]);
}

export { logger };
