// Runs once before the test files: a clean, migrated test database and the test mail catcher.
// Every test project inherits this file and vitest calls it once per project in the same process,
// so only the first call prepares (and later tears down); the others find it done.
// PLACARD_SKIP_DB=1 skips it for a quick run of the pure tests in tests/shared.
const PREPARED = Symbol.for('placard.test-database-prepared');
type Marked = typeof globalThis & { [PREPARED]?: Promise<() => Promise<void>> };

export default async function setup(): Promise<(() => Promise<void>) | void> {
  if (process.env.PLACARD_SKIP_DB === '1') return;
  const marked = globalThis as Marked;
  if (marked[PREPARED]) {
    await marked[PREPARED];
    return;
  }
  const { prepareTestDatabase } = await import('./test-database');
  marked[PREPARED] = prepareTestDatabase();
  return marked[PREPARED];
}
