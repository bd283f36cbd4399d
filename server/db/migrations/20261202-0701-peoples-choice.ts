import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

/** People's choice: the show's voting window and the visitors' votes (hashes only, never a token or an address). */
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  // Open while opened_at is set and closed_at is not; reopening sets opened_at again and clears closed_at.
  await qi.addColumn('events', 'peoples_choice_opened_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('events', 'peoples_choice_closed_at', { type: DataTypes.DATE, allowNull: true });

  await qi.createTable('votes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    entry_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'entries', key: 'id' }, onDelete: 'CASCADE' },
    // HMAC-SHA256 (keyed with the server's secret and the show) of the visitor's cookie token and of their address.
    voter_hash: { type: DataTypes.CHAR(64), allowNull: false },
    address_hash: { type: DataTypes.CHAR(64), allowNull: false },
    voided_at: { type: DataTypes.DATE, allowNull: true },
    voided_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  // One vote per visitor per show, voided or not: a voided vote does not give the token a second one.
  await qi.addIndex('votes', ['event_id', 'voter_hash'], { unique: true, name: 'votes_one_per_voter' });
  await qi.addIndex('votes', ['event_id', 'address_hash']);
  await qi.addIndex('votes', ['entry_id']);
  // The database itself refuses anything but a hex digest in the hash columns.
  await qi.sequelize.query(`ALTER TABLE votes ADD CONSTRAINT votes_hashes_only CHECK (voter_hash ~ '^[0-9a-f]{64}$' AND address_hash ~ '^[0-9a-f]{64}$')`);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('votes');
  await qi.removeColumn('events', 'peoples_choice_closed_at');
  await qi.removeColumn('events', 'peoples_choice_opened_at');
};
