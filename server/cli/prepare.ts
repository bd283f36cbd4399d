import { ensureDatabase } from '../db/cluster';

/** The database is there, its schema current and (in demo mode) the demo scenario loaded. */
export async function prepare(): Promise<void> {
  await ensureDatabase();
  await import('../models/index');
  const { migrate, seedDemo } = await import('../db/migrator');
  const { config } = await import('../config');
  await migrate();
  if (config.demoMode) await seedDemo();
}
