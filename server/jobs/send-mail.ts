import { config } from '../config';
import { logger } from '../logger';
import { createMailSender, type MailSender } from '../mail/mailer';
import { decodeMail } from '../mail/mail-job';
import { jobQueue, MAIL_QUEUE, type JobQueue } from './queue';

/**
 * Works the mail queue: each job is one message handed to the SMTP server. A refusal or a server
 * that is down throws, and pg-boss retries the job later with backoff; nothing is dropped.
 */
export async function startMailWorker(queue: JobQueue = jobQueue(), send: MailSender = createMailSender(config.smtpUrl)): Promise<void> {
  await queue.work(MAIL_QUEUE, async (job) => {
    const mail = decodeMail(job.data);
    try {
      await send(mail);
    } catch (err) {
      logger.warn({ err, jobId: job.id }, 'mail not sent yet: the queue will try again');
      throw err;
    }
  });
}
