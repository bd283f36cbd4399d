// Runs once before the test files: a clean, migrated test database and the test mail catcher.
// PLACARD_SKIP_DB=1 skips it for a quick run of the pure tests in tests/shared.
export default async function setup(): Promise<(() => Promise<void>) | void> {
  if (process.env.PLACARD_SKIP_DB === '1') return;
  const { prepareTestDatabase } = await import('./test-database');
  return prepareTestDatabase();
}
