import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

/** Bulk prints of numbered cards: one row per job, its progress and the finished file's storage key. */
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  await qi.createTable('card_prints', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    // null: every class of the show.
    class_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'event_classes', key: 'id' }, onDelete: 'CASCADE' },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'queued' },
    done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    total: { type: DataTypes.INTEGER, allowNull: false },
    rendered: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    file_key: { type: DataTypes.STRING(200), allowNull: true },
    error: { type: DataTypes.STRING(500), allowNull: true },
    started_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.sequelize.query(`ALTER TABLE card_prints ADD CONSTRAINT card_prints_status CHECK (status IN ('queued', 'running', 'done', 'failed'))`);
  await qi.sequelize.query(`ALTER TABLE card_prints ADD CONSTRAINT card_prints_progress CHECK (done >= 0 AND done <= total AND rendered >= 0 AND rendered <= done)`);
  // At most one print in progress per show and filter: a second start finds it instead of making another.
  await qi.sequelize.query(`CREATE UNIQUE INDEX card_prints_one_active ON card_prints (event_id, COALESCE(class_id, 0)) WHERE status IN ('queued', 'running')`);
  await qi.addIndex('card_prints', ['event_id', 'class_id', 'created_at']);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('card_prints');
};
