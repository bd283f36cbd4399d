import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

/** Judging: which judge scores which classes, the scores and per-car notes, and the show's result rules. */
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  const ref = (model: string, onDelete = 'CASCADE', allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' }, onDelete });

  // Set when the organiser closes judging: scores are refused from then on, even while the show is still "judging".
  await qi.addColumn('events', 'judging_closed_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('events', 'result_rules', {
    type: DataTypes.JSONB,
    allowNull: false,
    defaultValue: { trimFromSheets: null, placesPerClass: 3, bestOfShow: true, bestOfShowKeepsClassPlace: false, shareCommentsWithEntrants: true },
  });

  // A judge's classes; a row with no class means every class of the show.
  await qi.createTable('judge_assignments', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    judge_id: ref('users'),
    class_id: ref('event_classes', 'CASCADE', true),
    created_at: now,
  });
  await qi.addIndex('judge_assignments', ['event_id', 'judge_id', 'class_id'], { unique: true, name: 'judge_assignments_unique_class' });
  await qi.sequelize.query(`CREATE UNIQUE INDEX judge_assignments_unique_all ON judge_assignments (event_id, judge_id) WHERE class_id IS NULL`);

  const deviceStamp = {
    // The judge's own clock when the score was made, and the id the phone gave it: the newest wins, a replay changes nothing.
    device_time: { type: DataTypes.DATE, allowNull: false },
    client_id: { type: DataTypes.UUID, allowNull: false },
  };

  await qi.createTable('scores', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    entry_id: ref('entries'),
    judge_id: ref('users'),
    criterion_id: ref('criteria'),
    points: { type: DataTypes.INTEGER, allowNull: false },
    comment: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    ...deviceStamp,
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('scores', ['entry_id', 'judge_id', 'criterion_id'], { unique: true, name: 'scores_one_per_line' });
  await qi.addIndex('scores', ['event_id', 'judge_id']);
  await qi.sequelize.query(`ALTER TABLE scores ADD CONSTRAINT scores_points CHECK (points >= 0)`);

  await qi.createTable('sheet_notes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: ref('events'),
    entry_id: ref('entries'),
    judge_id: ref('users'),
    comment: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
    ...deviceStamp,
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('sheet_notes', ['entry_id', 'judge_id'], { unique: true, name: 'sheet_notes_one_per_sheet' });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const t of ['sheet_notes', 'scores', 'judge_assignments']) await qi.dropTable(t);
  await qi.removeColumn('events', 'result_rules');
  await qi.removeColumn('events', 'judging_closed_at');
};
