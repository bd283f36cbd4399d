import { TEST_ENV } from './test-env';

/**
 * Gives the run a clean, migrated test database (never the app's), and the catcher that
 * keeps mail sent during the tests. Runs in vitest's main process before any test file.
 */
export async function prepareTestDatabase(): Promise<() => Promise<void>> {
  Object.assign(process.env, TEST_ENV);
  const { ensureDatabase } = await import('@server/db/cluster');
  await ensureDatabase(undefined, [TEST_ENV.DB_NAME]);
  await import('@server/models/index');
  const { sequelize } = await import('@server/db/sequelize');
  const { migrate } = await import('@server/db/migrator');
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
  await migrate();
  const { startMailCatcher } = await import('@server/mail/catcher');
  const catcher = await startMailCatcher(Number(TEST_ENV.MAIL_CATCHER_PORT));
  return async () => {
    await new Promise<void>((resolve) => catcher.close(() => resolve()));
    await sequelize.close();
  };
}
