import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

/** Publishing results: the organiser's hand tie-breaks, and the results as published (the public page never recomputes). */
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  // Entries the rules left tied, in the order the organiser put them, with the reason they gave.
  await qi.createTable('manual_tie_breaks', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    entry_ids: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false },
    reason: { type: DataTypes.STRING(500), allowNull: false },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: now,
  });
  await qi.addIndex('manual_tie_breaks', ['event_id']);
  await qi.sequelize.query(`ALTER TABLE manual_tie_breaks ADD CONSTRAINT manual_tie_breaks_two_or_more CHECK (cardinality(entry_ids) >= 2)`);

  // One row per show, written in the transaction that publishes: places, totals and per-criterion means as they were.
  await qi.createTable('published_results', {
    event_id: { type: DataTypes.INTEGER, primaryKey: true, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    results: { type: DataTypes.JSONB, allowNull: false },
    published_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    published_at: now,
  });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('published_results');
  await qi.dropTable('manual_tie_breaks');
};
