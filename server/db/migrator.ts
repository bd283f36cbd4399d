import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { maintenanceSequelize } from './sequelize';

const here = path.dirname(fileURLToPath(import.meta.url));

export type MigrationContext = { queryInterface: QueryInterface };
export type Migration = (params: { context: MigrationContext }) => Promise<void>;

function migratorFor(folder: 'migrations' | 'seeders', tableName: string, sequelize: Sequelize) {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: ['*.ts', { cwd: path.join(here, folder), ignore: ['*.d.ts'] }],
      resolve: ({ name, path: file }) => ({
        name,
        up: async (p) => (await import(file!)).up(p),
        down: async (p) => (await import(file!)).down?.(p),
      }),
    },
    context: { queryInterface: sequelize.getQueryInterface() },
    storage: new SequelizeStorage({ sequelize, tableName }),
    logger: undefined,
  });
}

/** Schema changes: every file in migrations/, in name order, each applied once; two processes starting together take turns on an advisory lock. */
export async function migrate(): Promise<string[]> {
  return withLock(7_260_001, async (db) => (await migratorFor('migrations', 'schema_migrations', db).up()).map((m) => m.name));
}

/** Demo scenario: every file in seeders/, each applied once, so a second start neither duplicates nor wipes. */
export async function seedDemo(): Promise<string[]> {
  return withLock(7_260_002, async (db) => (await migratorFor('seeders', 'seed_runs', db).up()).map((m) => m.name));
}

// A transaction-scoped advisory lock: held by one connection until the work is done. Both run on an
// instance without the requests' statement bound (see maintenanceSequelize), closed when done.
async function withLock<T>(key: number, fn: (db: Sequelize) => Promise<T>): Promise<T> {
  const db = maintenanceSequelize();
  try {
    return await db.transaction(async (transaction) => {
      await db.query('SELECT pg_advisory_xact_lock(:key)', { replacements: { key }, transaction });
      return fn(db);
    });
  } finally {
    await db.close();
  }
}
