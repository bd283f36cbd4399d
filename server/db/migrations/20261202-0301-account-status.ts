import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// A site admin can disable an account (it cannot sign in; its public pages go offline) and sees its last sign-in.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.addColumn('users', 'disabled_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('users', 'last_sign_in_at', { type: DataTypes.DATE, allowNull: true });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('users', 'last_sign_in_at');
  await qi.removeColumn('users', 'disabled_at');
};
