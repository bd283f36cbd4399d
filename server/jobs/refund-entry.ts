import { logger } from '../logger';
import { sendEntryRefund, type RefundJob } from '../services/entries/entry-refunds';
import { jobQueue, REFUND_QUEUE, type JobQueue } from './queue';

/** Works the refund queue: a payment service that is down throws, and pg-boss retries later. */
export async function startRefundWorker(queue: JobQueue = jobQueue()): Promise<void> {
  await queue.work<RefundJob>(REFUND_QUEUE, async (job) => {
    try {
      await sendEntryRefund(job.data);
    } catch (err) {
      logger.warn({ err, jobId: job.id, entryId: job.data.entryId }, 'refund not sent yet: the queue will try again');
      throw err;
    }
  });
}
