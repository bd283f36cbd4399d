// Starts the mail catcher (demo mode), the local fakes, the job workers and the web server (one
// process, or several behind Node's cluster module with `--web-processes N`), then prints where to go.
import cluster from 'node:cluster';
import { fileURLToPath } from 'node:url';
import { config } from '../config';
import { keepRunningThroughDatabaseLoss } from '../process-guard';
import { DEMO_ACCOUNTS } from '../db/demo-accounts';
import { listen, logger } from '../index';
import { startDemoMailCatcher } from '../mail/demo-catcher';
import { startAllJobWorkers } from '../jobs/all-workers';
import { stopGracefully } from './graceful-stop';
import { pointPaymentsAtFake } from '../payments/client';
import { startLocalPayments } from '../payments/fake';
import { startFakeS3IfWanted } from '../storage/index';

keepRunningThroughDatabaseLoss();

const catcherWanted = config.demoMode && config.smtpUrl === `smtp://127.0.0.1:${config.mailCatcherPort}`;
const demoCatcher = catcherWanted ? await startDemoMailCatcher(config.mailCatcherPort) : undefined;
const catcherMoved = demoCatcher && demoCatcher.port !== demoCatcher.wantedPort;
if (catcherMoved) logger.warn(`Port ${demoCatcher.wantedPort} (MAIL_CATCHER_PORT) is taken by another program: this Placard's mail catcher listens on ${demoCatcher.port} instead, and its mail goes there.`);
const catcher = demoCatcher?.server;

const argAfter = (flag: string) => {
  const i = process.argv.indexOf(flag);
  return i >= 0 ? process.argv[i + 1] : undefined;
};
const webProcesses = Number(argAfter('--web-processes') ?? config.webProcesses);
if (!Number.isInteger(webProcesses) || webProcesses < 1 || webProcesses > 32) throw new Error('--web-processes takes a whole number from 1 to 32.');
const runJobs = config.runJobs && !process.argv.includes('--no-jobs');

const fakeS3 = await startFakeS3IfWanted();
const server = webProcesses === 1 ? await listen() : undefined;
if (webProcesses > 1) await startWebProcesses(webProcesses);
// The one-machine default: this process also works the job queue; `--no-jobs` leaves it to `npm run worker`.
if (runJobs) await startAllJobWorkers(demoCatcher?.smtpUrl ?? config.smtpUrl);
const url = `http://${config.host}:${config.port}`;

/** Forks the web processes (each runs cli/web-process.ts) and waits until every one listens. */
async function startWebProcesses(count: number): Promise<void> {
  cluster.setupPrimary({ exec: fileURLToPath(new URL('./web-process.ts', import.meta.url)), execArgv: ['--import', 'tsx'] });
  const env = fakeS3 ? { PLACARD_FAKE_S3_ENDPOINT: fakeS3.endpoint } : {};
  await Promise.all(
    Array.from({ length: count }, () => {
      const child = cluster.fork(env);
      return new Promise<void>((resolve, reject) => {
        child.on('message', (m: { listening?: boolean }) => m.listening && resolve());
        child.once('exit', (code) => reject(new Error(`A web process exited with ${code} before listening.`)));
      });
    }),
  );
  // One that dies later is replaced, so the port keeps its processes.
  cluster.on('exit', (child, code, signal) => {
    if (stopping) return;
    logger.warn({ pid: child.process.pid, code, signal }, 'a web process stopped: starting another');
    cluster.fork(env);
  });
}

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
  `  Placard is running on ${url}${webProcesses > 1 ? ` (${webProcesses} web processes)` : ''}`,
  ...(runJobs ? [] : ['  Jobs: not worked here (--no-jobs): run `npm run worker` beside it']),
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
  const children = Object.values(cluster.workers ?? {}).filter((c) => c !== undefined);
  const childrenGone = Promise.all(children.map((c) => new Promise<void>((resolve) => (c.isDead() ? resolve() : c.once('exit', () => resolve())))));
  for (const child of children) child.kill('SIGTERM');
  await stopGracefully(server, 10_000, async () => {
    await childrenGone; // each finishes its requests in flight first

    catcher?.close(() => undefined);
    await fakePayments?.close();
    await fakeS3?.close();
  });
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
