// Starts the mail catcher (demo mode) and the one Express server, then prints where to go.
import { config } from '../config';
import { DEMO_ACCOUNTS } from '../db/demo-accounts';
import { closeConnections, listen, logger } from '../index';
import { startMailCatcher } from '../mail/catcher';
import { startMailWorker } from '../jobs/send-mail';

const catcherWanted = config.demoMode && config.smtpUrl === `smtp://127.0.0.1:${config.mailCatcherPort}`;
const catcher = catcherWanted
  ? await startMailCatcher(config.mailCatcherPort).catch((err: NodeJS.ErrnoException) => {
      if (err.code !== 'EADDRINUSE') throw err;
      logger.warn(`Port ${config.mailCatcherPort} is taken: assuming another Placard mail catcher is running there.`);
      return undefined;
    })
  : undefined;

const server = await listen();
// The one-machine default: this process also works the job queue (mail now; more jobs join it).
await startMailWorker();
const url = `http://${config.host}:${config.port}`;
const lines = [
  '',
  `  Placard is running on ${url}`,
  ...(config.demoMode
    ? [
        '',
        '  Demo accounts (e-mail / password):',
        ...DEMO_ACCOUNTS.map((a) => `    ${a.role.padEnd(11)} ${a.email.padEnd(24)} ${a.password}`),
        '',
        `  Mail is caught, not sent: the site admin reads it at ${url}/admin/mail`,
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
  await closeConnections();
  process.exit(0);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
