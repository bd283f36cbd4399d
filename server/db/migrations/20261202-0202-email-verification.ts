import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  const now = { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW };
  await qi.addColumn('users', 'email_verified_at', { type: DataTypes.DATE, allowNull: true });
  // Accounts made before addresses were confirmed keep working as they did.
  await qi.sequelize.query('UPDATE users SET email_verified_at = created_at');

  await qi.createTable('email_verification_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
    updated_at: now,
  });
  await qi.addIndex('email_verification_tokens', ['user_id']);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('email_verification_tokens');
  await qi.removeColumn('users', 'email_verified_at');
};
