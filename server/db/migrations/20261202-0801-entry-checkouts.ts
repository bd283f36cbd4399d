import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// Online entry fees: the entry remembers its open checkout (a second click reopens it) and the refund the payment service made.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.addColumn('entries', 'checkout_id', { type: DataTypes.STRING(255), allowNull: true });
  await qi.addColumn('entries', 'checkout_attempt', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  await qi.addColumn('entries', 'refund_ref', { type: DataTypes.STRING(255), allowNull: true });
  await qi.addColumn('entries', 'refunded_at', { type: DataTypes.DATE, allowNull: true });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const column of ['refunded_at', 'refund_ref', 'checkout_attempt', 'checkout_id']) await qi.removeColumn('entries', column);
};
