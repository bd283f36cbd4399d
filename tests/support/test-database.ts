import { TEST_ENV } from './test-env';

/**
 * Gives the run a clean, migrated test database (never the app's), the catcher that keeps mail
 * sent during the tests, and the worker that sends the queued mail to it. Runs in vitest's main process before any test file.
 */
export async function prepareTestDatabase(): Promise<() => Promise<void>> {
  Object.assign(process.env, TEST_ENV);
  const { ensureDatabase } = await import('@server/db/cluster');
  await ensureDatabase(undefined, [TEST_ENV.DB_NAME]);
  await import('@server/models/index');
  const { sequelize } = await import('@server/db/sequelize');
  const { migrate } = await import('@server/db/migrator');
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public; DROP SCHEMA IF EXISTS pgboss CASCADE;');
  await migrate();
  // Commits of the test database do not wait for the disk: nothing here must outlive a crash of the machine,
  // and every commit is still atomic and seen at once. (The restart tests use a cluster of their own.)
  await sequelize.query(`ALTER DATABASE "${TEST_ENV.DB_NAME}" SET synchronous_commit = off`);
  const { startMailCatcher } = await import('@server/mail/catcher');
  const catcher = await startMailCatcher(Number(TEST_ENV.MAIL_CATCHER_PORT));
  // The one mail worker of the run, as the server would run it: test files queue, this process sends.
  const { startMailWorker } = await import('@server/jobs/send-mail');
  const { stopJobQueue } = await import('@server/jobs/queue');
  await startMailWorker();
  // No refund worker here: refunds go to a fake payment service, which only a test file that pays has (useFakePayments).
  return async () => {
    await stopJobQueue();
    await new Promise<void>((resolve) => catcher.close(() => resolve()));
    await sequelize.close();
  };
}
