import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    is_site_admin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    may_organise: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: now,
    updated_at: now,
  });

  // The table connect-pg-simple expects (its own schema), made here so only migrations change the schema.
  await qi.createTable('session', {
    sid: { type: DataTypes.STRING, primaryKey: true },
    sess: { type: DataTypes.JSON, allowNull: false },
    expire: { type: 'TIMESTAMP(6)', allowNull: false },
  });
  await qi.addIndex('session', ['expire'], { name: 'IDX_session_expire' });

  await qi.createTable('password_reset_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('password_reset_tokens', ['user_id']);

  await qi.createTable('caught_mails', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    from: { type: DataTypes.TEXT, allowNull: false },
    to: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.TEXT, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: true },
    created_at: now,
    updated_at: now,
  });

  // Rate-limit counters live in the database so several server processes share them.
  await qi.createTable('rate_limit_hits', {
    key: { type: DataTypes.STRING(300), primaryKey: true },
    hits: { type: DataTypes.INTEGER, allowNull: false },
    reset_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const t of ['rate_limit_hits', 'caught_mails', 'password_reset_tokens', 'session', 'users']) await qi.dropTable(t);
};
