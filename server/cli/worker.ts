// `npm run worker`: a job worker and no web server. Run one or more beside web processes started with
// `npm start -- --no-jobs` (or RUN_JOBS=false); they share the work through the queue in PostgreSQL.
import { config } from '../config';
import { keepRunningThroughDatabaseLoss } from '../process-guard';
import { closeConnections, logger } from '../index';
import { migrate } from '../db/migrator';
import { startAllJobWorkers } from '../jobs/all-workers';
import { pointPaymentsAtFake } from '../payments/client';
import { startFakeS3IfWanted } from '../storage/index';

keepRunningThroughDatabaseLoss();
await migrate(); // a no-op when a web process migrated first; safe to run side by side (the migrator locks)
// The local fakes belong to `npm start`: a worker on this machine uses the ones it started.
if (config.payments.mode === 'fake') pointPaymentsAtFake({ host: '127.0.0.1', port: config.payments.fakePort });
await startFakeS3IfWanted();
await startAllJobWorkers(config.smtpUrl);
logger.info({ pid: process.pid }, 'job worker running');
console.log(`  Placard job worker ${process.pid} is working the queue (mail, refunds, cards, reminders, the waiting-list sweep).`);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  // No new job is taken; a job in hand finishes within JOB_STOP_GRACE_SECONDS, or goes back to the
  // queue for another worker (a bulk print resumes there from the cards already drawn).
  logger.info({ pid: process.pid, graceMs: config.jobStopGraceMs }, 'job worker stopping');
  await closeConnections();
  logger.info({ pid: process.pid }, 'job worker stopped');
  process.exit(0);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
// Started by a parent process with a channel (a supervisor, a test): stop with it.
process.on('disconnect', stop);
