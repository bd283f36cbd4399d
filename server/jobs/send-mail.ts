import { config } from '../config';
import { logger } from '../logger';
import { createMailSender, type MailSender } from '../mail/mailer';
import { decodeMail, MailJobSchema } from '../mail/mail-job';
import { jobQueue, MAIL_QUEUE, type JobQueue } from './queue';

/** A few messages in flight at once: a results day mails every entrant, and each message waits on the mail server's answers. */
const MAIL_SENDS_AT_ONCE = 4;
/** After this many lost acknowledgements the message is taken as delivered: the server kept it at least once, most likely. */
const LOST_ACK_RETRY_LIMIT = 3;

/**
 * The mail server refused after the whole message was handed over with a "try later" code (421 and the
 * other 4xx answers to the end of the data): it may have kept the message before dropping the line. A
 * quick retry would then be a copy in the inbox, so this one waits much longer than a plain failure.
 */
export function acknowledgementLost(err: unknown): boolean {
  const e = err as { code?: string; responseCode?: number };
  return e.code === 'EMESSAGE' && typeof e.responseCode === 'number' && e.responseCode >= 400 && e.responseCode < 500;
}

/**
 * Works the mail queue: each job is one message handed to the SMTP server, with its Message-ID from
 * when it was queued. A refusal or a server that is down throws, and pg-boss retries the job later
 * with backoff; a lost acknowledgement queues the same message (same Message-ID) to go again after
 * `mailLostAckRetrySeconds × 2^n`, never at once. Nothing is dropped.
 */
export async function startMailWorker(queue: JobQueue = jobQueue(), send: MailSender = createMailSender(config.smtpUrl)): Promise<void> {
  const firstWait = queue.options.mailLostAckRetrySeconds ?? 900;
  const sendOne = async (job: { id: string; data: unknown }) => {
    const mail = decodeMail(job.data);
    try {
      await send({ ...mail, messageId: mail.messageId ?? `<${job.id}@placard.invalid>` });
    } catch (err) {
      const lostAcks = MailJobSchema.parse(job.data).lostAcks ?? 0;
      if (acknowledgementLost(err) && lostAcks < LOST_ACK_RETRY_LIMIT) {
        const wait = firstWait * 2 ** lostAcks;
        logger.warn({ err, jobId: job.id, messageId: mail.messageId, waitSeconds: wait }, 'mail server answered after the message: it may have kept it, sending again later');
        await queue.send(MAIL_QUEUE, { ...MailJobSchema.parse(job.data), lostAcks: lostAcks + 1 }, undefined, { startAfterSeconds: wait });
        return;
      }
      logger.warn({ err, jobId: job.id }, 'mail not sent yet: the queue will try again');
      throw err;
    }
  };
  await queue.work(MAIL_QUEUE, sendOne, { concurrency: MAIL_SENDS_AT_ONCE });
}
