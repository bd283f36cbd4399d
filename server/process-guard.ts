import { logger } from './logger';
import { isDatabaseUnavailable } from './services/platform/database-unavailable';

/**
 * A pg client that loses its server while nobody listens for its 'error' event (a client between two
 * queries of whoever checked it out, when the postmaster is killed) would end the whole process with an
 * unhandled 'error'. That client is dead already and its owner sees a failed query next; the server
 * must not die with it. Any other uncaught exception still stops the process, as Node would.
 */
export function keepRunningThroughDatabaseLoss(): void {
  process.on('uncaughtException', (err, origin) => {
    if (isDatabaseUnavailable(err)) {
      logger.error({ err }, 'database unavailable: a connection was lost outside a query; the server carries on');
      return;
    }
    console.error(err);
    logger.fatal({ err, origin }, 'uncaught exception: the server stops');
    process.exit(1);
  });
}
