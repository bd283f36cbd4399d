import type { Transaction } from 'sequelize';
import { sendMail, type OutgoingMail } from './mailer';

export type QueuedMail = OutgoingMail;

export type QueueMailOptions = {
  /** When given, the mail is queued inside this transaction: it is sent only if the transaction commits. */
  transaction?: Transaction;
  /** Same key, same mail: a second call with a key already queued sends nothing more. */
  dedupeKey?: string;
};

/**
 * The one way the product sends a notice. Today it sends at once; the job queue (pg-boss on the
 * same PostgreSQL) replaces the body so a mail server that is down delays mail and loses none.
 * Callers never await delivery, only queuing.
 */
export async function queueMail(mail: QueuedMail, options: QueueMailOptions = {}): Promise<void> {
  void options; // honoured once the queue lands; until then the mail goes out at once
  await sendMail(mail);
}
