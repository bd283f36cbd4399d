import type { Migration } from '../migrator';

// What a show asks for on its entry form beyond name, e-mail and phone, and what each entrant agreed
// to share when entering: the one rule for which private build fields a show's organisers see.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(`
    ALTER TABLE events ADD COLUMN asks_for TEXT[] NOT NULL DEFAULT '{}'
      CONSTRAINT events_asks_for_known CHECK (asks_for <@ ARRAY['plate', 'vin', 'address']::TEXT[]);
    ALTER TABLE entries ADD COLUMN shared_fields TEXT[] NOT NULL DEFAULT '{}'
      CONSTRAINT entries_shared_fields_known CHECK (shared_fields <@ ARRAY['plate', 'vin', 'address']::TEXT[]);
  `);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('entries', 'shared_fields');
  await qi.removeColumn('events', 'asks_for');
};
