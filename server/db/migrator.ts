import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface } from 'sequelize';
import { sequelize } from './sequelize';

const here = path.dirname(fileURLToPath(import.meta.url));

export type MigrationContext = { queryInterface: QueryInterface };
export type Migration = (params: { context: MigrationContext }) => Promise<void>;

function migratorFor(folder: 'migrations' | 'seeders', tableName: string) {
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

/** Schema changes: every file in migrations/, in name order, each applied once. */
export const migrator = migratorFor('migrations', 'schema_migrations');
/** Demo scenario: every file in seeders/, each applied once, so a second start neither duplicates nor wipes. */
export const seeder = migratorFor('seeders', 'seed_runs');

/** Runs pending migrations; two processes starting together take turns on an advisory lock. */
export async function migrate(): Promise<string[]> {
  return withLock(7_260_001, async () => (await migrator.up()).map((m) => m.name));
}

export async function seedDemo(): Promise<string[]> {
  return withLock(7_260_002, async () => (await seeder.up()).map((m) => m.name));
}

// A transaction-scoped advisory lock: held by one pooled connection until the work is done.
async function withLock<T>(key: number, fn: () => Promise<T>): Promise<T> {
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(:key)', { replacements: { key }, transaction });
    return fn();
  });
}
