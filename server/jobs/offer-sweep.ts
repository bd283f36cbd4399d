import { logger } from '../logger';
import { sweepExpiredOffers } from '../services/entries/waitlist';

/**
 * Every minute, lapsed waiting-list offers pass to the next in line even when nobody opens the show
 * (reads and registrations settle them too). A failed sweep (database away) is logged and tried again.
 */
export function startOfferSweep(everyMs = 60_000): () => void {
  let running = false;
  const timer = setInterval(() => {
    if (running) return;
    running = true;
    sweepExpiredOffers()
      .then((shows) => shows > 0 && logger.info({ shows }, 'lapsed waiting-list offers passed on'))
      .catch((err: unknown) => logger.warn({ err }, 'waiting-list sweep failed; it runs again in a minute'))
      .finally(() => (running = false));
  }, everyMs);
  timer.unref();
  return () => clearInterval(timer);
}
