import { QueryTypes, type Transaction } from 'sequelize';
import { config } from '../config';
import { sequelize } from '../db/sequelize';
import { jobQueue, MAIL_QUEUE, type JobQueue } from '../jobs/queue';
import { encodeMail } from './mail-job';
import type { OutgoingMail } from './mailer';

export type QueuedMail = OutgoingMail;

export type QueueMailOptions = {
  /** When given, the mail is queued inside this transaction: it exists, and is sent, only if the transaction commits. */
  transaction?: Transaction;
  /** Same key, same mail: a second call with a key already queued sends nothing more, ever. */
  dedupeKey?: string;
};

/**
 * The one way the product sends a notice: a job in the queue (pg-boss on the same PostgreSQL),
 * sent by a worker and retried with backoff while the mail server is down. Callers wait for the
 * queuing only, never for delivery. Resolves to false when the dedupe key was already used.
 */
export async function queueMail(mail: QueuedMail, options: QueueMailOptions = {}): Promise<boolean> {
  return enqueueMail(jobQueue(), mail, options);
}

/** True when a notice with this dedupe key was queued before: a caller can skip costly work for it. */
export async function mailAlreadyQueued(dedupeKey: string): Promise<boolean> {
  const rows = await sequelize.query('SELECT 1 FROM mail_dedupe_keys WHERE key = $1', { bind: [dedupeKey], type: QueryTypes.SELECT });
  return rows.length > 0;
}

/** queueMail() on a given queue (tests run one with its own mail server). */
export async function enqueueMail(queue: JobQueue, mail: QueuedMail, options: QueueMailOptions = {}): Promise<boolean> {
  await queue.start(); // before any transaction: the first start creates pg-boss's tables on its own connection
  const write = async (transaction: Transaction) => {
    if (options.dedupeKey !== undefined) {
      // The key is written with the job, in the same transaction, so a key means exactly one job.
      const fresh = await sequelize.query('INSERT INTO mail_dedupe_keys (key, created_at) VALUES ($1, now()) ON CONFLICT DO NOTHING RETURNING key', {
        bind: [options.dedupeKey],
        transaction,
        type: QueryTypes.SELECT,
      });
      if (fresh.length === 0) return false;
    }
    await queue.send(MAIL_QUEUE, encodeMail(mail, config.mailFrom), transaction);
    return true;
  };
  return options.transaction ? write(options.transaction) : sequelize.transaction(write);
}
