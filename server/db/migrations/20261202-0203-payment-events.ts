import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// Every payment webhook event handled, by the service's event id: a replay or duplicate finds its id here and changes nothing.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.createTable('payment_events', {
    id: { type: DataTypes.STRING(255), primaryKey: true },
    type: { type: DataTypes.STRING(100), allowNull: false },
    reference: { type: DataTypes.STRING(120), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('payment_events', ['reference']);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('payment_events');
};
