import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// A show's logo, stored like build photos (same keys and widths): { storageKey, variants: [{ width, height }] }.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.addColumn('events', 'logo', { type: DataTypes.JSONB, allowNull: true });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('events', 'logo');
};
