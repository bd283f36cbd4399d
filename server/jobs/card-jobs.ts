import { config } from '../config';
import { logger } from '../logger';
import { requeueStalePrints, runCardPrint, type CardPrintJob } from '../services/show-day/card-prints';
import { sendShowReminders, type ShowReminderJob } from './show-reminders';
import { CARD_QUEUE, jobQueue, type JobQueue } from './queue';

export type CardJob = CardPrintJob | ShowReminderJob;

/**
 * Works the card queue: bulk prints of numbered cards and show reminders (each with the owner's card).
 * Both watch the queue's hand-back signal: a worker told to stop puts the rest of its job back on the queue.
 */
export async function startCardWorker(queue: JobQueue = jobQueue()): Promise<void> {
  await queue.work<CardJob>(CARD_QUEUE, async (job, { handBack }) => {
    if (job.data.kind === 'print') await runCardPrint(job.data.printId, handBack);
    else if (job.data.kind === 'reminders') await sendShowReminders(job.data.eventId, handBack);
    else logger.warn({ jobId: job.id }, 'card queue: unknown job kind');
  });
}

/**
 * Every half of CARD_PRINT_STALE_SECONDS, puts back on the queue the prints whose worker stopped beating
 * (killed with SIGKILL, lost with its machine), so a live worker finishes them within seconds. This is
 * upkeep of the workers themselves, as pg-boss's own supervision is, so it is a timer in each process
 * that works cards rather than a scheduled job (whose cron counts in minutes); the sweeps of several
 * processes never take the same print twice. It ends when the queue stops.
 */
export function startStalePrintSweep(queue: JobQueue = jobQueue()): void {
  const timer = setInterval(() => {
    requeueStalePrints().catch((err: unknown) => logger.warn({ err }, 'card print sweep failed (tried again shortly)'));
  }, Math.max(1_000, (config.cardPrintStaleSeconds * 1000) / 2));
  timer.unref();
  queue.stopping.addEventListener('abort', () => clearInterval(timer), { once: true });
}
