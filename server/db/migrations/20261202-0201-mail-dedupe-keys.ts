import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// One row per dedupe key ever used by queueMail(): written with the mail's job, so a key sends at most one mail.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.createTable('mail_dedupe_keys', {
    key: { type: DataTypes.STRING(300), primaryKey: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('mail_dedupe_keys');
};
