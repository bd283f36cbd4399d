import { logger } from '../logger';
import { runCardPrint, type CardPrintJob } from '../services/show-day/card-prints';
import { sendShowReminders, type ShowReminderJob } from './show-reminders';
import { CARD_QUEUE, jobQueue, type JobQueue } from './queue';

export type CardJob = CardPrintJob | ShowReminderJob;

/** Works the card queue: bulk prints of numbered cards and show reminders (each with the owner's card). */
export async function startCardWorker(queue: JobQueue = jobQueue()): Promise<void> {
  await queue.work<CardJob>(CARD_QUEUE, async (job) => {
    if (job.data.kind === 'print') await runCardPrint(job.data.printId);
    else if (job.data.kind === 'reminders') await sendShowReminders(job.data.eventId);
    else logger.warn({ jobId: job.id }, 'card queue: unknown job kind');
  });
}
