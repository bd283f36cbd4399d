import { logger } from '../logger';
import { sweepExpiredOffers } from '../services/entries/waitlist';
import { jobQueue, OFFER_SWEEP_QUEUE, type JobQueue } from './queue';

/**
 * Works the minute's sweep (a scheduled job, `OFFER_SWEEP_CRON`): lapsed waiting-list offers pass to
 * the next in line even when nobody opens the show (reads and registrations settle them too). A failed
 * sweep (database away) is logged; the next minute's job tries again.
 */
export async function startOfferSweepWorker(queue: JobQueue = jobQueue()): Promise<void> {
  await queue.work(OFFER_SWEEP_QUEUE, async () => {
    const shows = await sweepExpiredOffers();
    if (shows > 0) logger.info({ shows }, 'lapsed waiting-list offers passed on');
  });
}
