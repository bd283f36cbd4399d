import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  const buildRef = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' };

  await qi.createTable('builds', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    owner_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    code: { type: DataTypes.STRING(8), allowNull: false, unique: true },
    title: { type: DataTypes.STRING(120), allowNull: false },
    model_year: { type: DataTypes.INTEGER, allowNull: true },
    body_origin: { type: DataTypes.STRING(200), allowNull: true },
    style: { type: DataTypes.STRING(40), allowNull: true },
    story: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    weight: { type: DataTypes.JSONB, allowNull: true },
    credits: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    card_settings: { type: DataTypes.JSONB, allowNull: true },
    published: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    // Private: never on a public page, public API or card.
    vin: { type: DataTypes.STRING(40), allowNull: true },
    plate: { type: DataTypes.STRING(20), allowNull: true },
    owner_phone: { type: DataTypes.STRING(40), allowNull: true },
    owner_address: { type: DataTypes.STRING(400), allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('builds', ['owner_id']);

  // Codes are never reused, even after a build is deleted: an old printed card must not open someone else's car.
  await qi.createTable('retired_build_codes', {
    code: { type: DataTypes.STRING(8), primaryKey: true },
    retired_at: now,
  });

  await qi.createTable('build_sections', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    build_id: buildRef,
    kind: { type: DataTypes.STRING(20), allowNull: false },
    data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('build_sections', ['build_id', 'kind'], { unique: true });

  await qi.createTable('photos', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    build_id: buildRef,
    storage_key: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    is_cover: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    variants: { type: DataTypes.JSONB, allowNull: false },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('photos', ['build_id', 'position']);

  await qi.createTable('dyno_runs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    build_id: buildRef,
    date: { type: DataTypes.DATEONLY, allowNull: false },
    data: { type: DataTypes.JSONB, allowNull: false },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('dyno_runs', ['build_id', 'date']);

  await qi.createTable('weigh_ins', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    build_id: buildRef,
    date: { type: DataTypes.DATEONLY, allowNull: false },
    data: { type: DataTypes.JSONB, allowNull: false },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('weigh_ins', ['build_id', 'date']);

  await qi.createTable('figure_changes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    build_id: buildRef,
    path: { type: DataTypes.STRING(120), allowNull: false },
    before: { type: DataTypes.JSONB, allowNull: false },
    after: { type: DataTypes.JSONB, allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('figure_changes', ['build_id', 'created_at']);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const t of ['figure_changes', 'weigh_ins', 'dyno_runs', 'photos', 'build_sections', 'retired_build_codes', 'builds']) await qi.dropTable(t);
};
