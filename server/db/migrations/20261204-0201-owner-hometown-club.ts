import type { Migration } from '../migrator';

// Hometown and club: optional public words an owner chooses to show beside their name on results,
// certificates and the announcer's read-out.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(`
    ALTER TABLE users ADD COLUMN hometown VARCHAR(80);
    ALTER TABLE users ADD COLUMN club VARCHAR(80);
  `);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('users', 'club');
  await qi.removeColumn('users', 'hometown');
};
