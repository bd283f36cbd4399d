import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// A running print is held by one worker run (its token) that beats every few seconds; a print whose
// beat stopped (the worker was killed) can be taken over instead of blocking printing until the queue's expiry.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.addColumn('card_prints', 'heartbeat_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('card_prints', 'worker_token', { type: DataTypes.UUID, allowNull: true });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('card_prints', 'worker_token');
  await qi.removeColumn('card_prints', 'heartbeat_at');
};
