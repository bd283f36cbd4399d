import type { Migration } from '../migrator';

// The gate's offline outbox: each check-in a phone queued is kept by the id the phone gave it, so a
// replay of the same check-in is answered from here and never applied twice; `outcome` says whether it
// checked the car in or found it already checked in (by another gate). Walk-ups: the name (and e-mail,
// if given) of an entrant entered at the gate without an account; private, for the organisers only.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(`
    CREATE TABLE gate_check_ins (
      client_id UUID PRIMARY KEY,
      event_id INTEGER NOT NULL REFERENCES events(id) ON DELETE CASCADE,
      entry_id INTEGER NOT NULL REFERENCES entries(id) ON DELETE CASCADE,
      device_id UUID NOT NULL,
      sequence INTEGER NOT NULL,
      device_time TIMESTAMPTZ NOT NULL,
      actor_id INTEGER REFERENCES users(id) ON DELETE SET NULL,
      outcome TEXT NOT NULL CONSTRAINT gate_check_ins_outcome_known CHECK (outcome IN ('checked_in', 'already_checked_in')),
      cash_taken BOOLEAN NOT NULL DEFAULT FALSE,
      created_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX gate_check_ins_event ON gate_check_ins (event_id, entry_id);
    ALTER TABLE entries ADD COLUMN walk_up_name TEXT, ADD COLUMN walk_up_email TEXT;
  `);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('entries', 'walk_up_email');
  await qi.removeColumn('entries', 'walk_up_name');
  await qi.dropTable('gate_check_ins');
};
