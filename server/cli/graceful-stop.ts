import type { Server } from 'node:http';
import { closeConnections, logger } from '../index';
import { startDraining } from '../services/platform/health';

let stopping = false;

/**
 * Stops taking requests, lets those in flight finish (at most `graceMs`), then closes the job queue
 * (a job in hand finishes or goes back to the queue) and the database, and exits.
 */
export async function stopGracefully(server: Server | undefined, graceMs = 10_000, before: () => Promise<void> = async () => undefined): Promise<void> {
  if (stopping) return;
  stopping = true;
  startDraining();
  if (server) {
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    const late = setTimeout(() => {
      logger.warn('stopping: requests still running after the grace period are cut');
      server.closeAllConnections();
    }, graceMs);
    await closed;
    clearTimeout(late);
  }
  await before();
  await closeConnections();
  process.exit(0);
}
