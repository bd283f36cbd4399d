import { createMailSender } from '../mail/mailer';
import { jobQueue } from './queue';
import { startMailWorker } from './send-mail';
import { startRefundWorker } from './refund-entry';
import { startOfferSweepWorker } from './offer-sweep';
import { startCardWorker, startStalePrintSweep } from './card-jobs';

/**
 * Every job the product queues, worked in this process: mail, refunds, bulk cards and show
 * reminders (with the sweep that takes over a print whose worker died), the waiting-list sweep.
 * `npm start` runs them beside the web server by default;
 * `npm run worker` runs them alone, for as many worker processes as the load needs.
 */
export async function startAllJobWorkers(smtpUrl: string): Promise<void> {
  await startMailWorker(jobQueue(), createMailSender(smtpUrl));
  await startRefundWorker();
  await startOfferSweepWorker();
  await startCardWorker();
  startStalePrintSweep();
}
