// Starts the mail catcher (demo mode) and the one Express server, then prints where to go.
import { config } from '../config';
import { keepRunningThroughDatabaseLoss } from '../process-guard';
import { DEMO_ACCOUNTS } from '../db/demo-accounts';
import { closeConnections, listen, logger } from '../index';
import { startDemoMailCatcher } from '../mail/demo-catcher';
import { createMailSender } from '../mail/mailer';
import { jobQueue } from '../jobs/queue';
import { startMailWorker } from '../jobs/send-mail';
import { startRefundWorker } from '../jobs/refund-entry';
import { startOfferSweepWorker } from '../jobs/offer-sweep';
import { startCardWorker } from '../jobs/card-jobs';
import { pointPaymentsAtFake } from '../payments/client';
import { startLocalPayments } from '../payments/fake';
import { startFakeS3IfWanted } from '../storage/index';

keepRunningThroughDatabaseLoss();

const catcherWanted = config.demoMode && config.smtpUrl === `smtp://127.0.0.1:${config.mailCatcherPort}`;
const demoCatcher = catcherWanted ? await startDemoMailCatcher(config.mailCatcherPort) : undefined;
const catcherMoved = demoCatcher && demoCatcher.port !== demoCatcher.wantedPort;
if (catcherMoved) logger.warn(`Port ${demoCatcher.wantedPort} (MAIL_CATCHER_PORT) is taken by another program: this Placard's mail catcher listens on ${demoCatcher.port} instead, and its mail goes there.`);
const catcher = demoCatcher?.server;

const fakeS3 = await startFakeS3IfWanted();
const server = await listen();
// The one-machine default: this process also works the job queue (mail now; more jobs join it).
await startMailWorker(jobQueue(), createMailSender(demoCatcher?.smtpUrl ?? config.smtpUrl));
await startRefundWorker();
await startOfferSweepWorker();
await startCardWorker();
const url = `http://${config.host}:${config.port}`;

// No payment key: the local fake stands in, posting its webhooks to this server.
const fakePayments =
  config.payments.mode === 'fake'
    ? await startLocalPayments({ port: config.payments.fakePort, webhookUrl: `${url}/api/payments/webhook` }).catch((err: NodeJS.ErrnoException) => {
        if (err.code !== 'EADDRINUSE') throw err;
        logger.warn(`Port ${config.payments.fakePort} is taken: assuming another Placard's fake payment service is running there.`);
        pointPaymentsAtFake({ host: '127.0.0.1', port: config.payments.fakePort });
        return undefined;
      })
    : undefined;
const paymentsLine =
  config.payments.mode === 'hosted'
    ? '  Payments: the hosted payment service (STRIPE_SECRET_KEY is set)'
    : config.payments.mode === 'off'
      ? '  Payments: online payment is switched off (PAYMENTS_ONLINE=false): fees are taken in person'
      : `  Payments: the local fake payment service on http://127.0.0.1:${fakePayments?.port ?? config.payments.fakePort} (no STRIPE_SECRET_KEY: no money moves)`;
const storageLine = config.objectStorage
  ? `  Files: S3 bucket "${config.objectStorage.bucket}" on ${config.objectStorage.fake ? `the local fake S3, http://127.0.0.1:${fakeS3?.port ?? config.objectStorage.fakePort}` : (config.objectStorage.endpoint ?? `AWS ${config.objectStorage.region}`)}`
  : `  Files: the local disk, ${config.storageDir}`;
const lines = [
  '',
  `  Placard is running on ${url}`,
  paymentsLine,
  storageLine,
  ...(config.demoMode
    ? [
        '',
        '  Demo accounts (e-mail / password):',
        ...DEMO_ACCOUNTS.map((a) => `    ${a.role.padEnd(12)} ${a.email.padEnd(26)} ${a.password}`),
        '',
        `  Mail is caught, not sent: the site admin reads it at ${url}/admin/mail`,
        ...(catcherMoved ? [`  (port ${demoCatcher.wantedPort} was taken, so the mail catcher listens on ${demoCatcher.port})`] : []),
      ]
    : []),
  '',
];
console.log(lines.join('\n'));

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  server.close();
  catcher?.close(() => undefined);
  await fakePayments?.close();
  await fakeS3?.close();
  await closeConnections();
  process.exit(0);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
