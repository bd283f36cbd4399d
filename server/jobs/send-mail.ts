import { config } from '../config';
import { logger } from '../logger';
import { createMailSender, type MailSender } from '../mail/mailer';
import { decodeMail } from '../mail/mail-job';
import { jobQueue, MAIL_QUEUE, type JobQueue } from './queue';

/** A few messages in flight at once: a results day mails every entrant, and each message waits on the mail server's answers. */
const MAIL_SENDS_AT_ONCE = 4;

/**
 * Works the mail queue: each job is one message handed to the SMTP server. A refusal or a server
 * that is down throws, and pg-boss retries the job later with backoff; nothing is dropped.
 */
export async function startMailWorker(queue: JobQueue = jobQueue(), send: MailSender = createMailSender(config.smtpUrl)): Promise<void> {
  const sendOne = async (job: { id: string; data: unknown }) => {
    const mail = decodeMail(job.data);
    try {
      await send(mail);
    } catch (err) {
      logger.warn({ err, jobId: job.id }, 'mail not sent yet: the queue will try again');
      throw err;
    }
  };
  await queue.work(MAIL_QUEUE, sendOne, { concurrency: MAIL_SENDS_AT_ONCE });
}
