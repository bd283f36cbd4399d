import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// The server orders a judge's lines, not the phones' clocks: each line keeps the phone it came from
// and that phone's own sequence number, and every item received is remembered by its id, so a
// retried send is known as a replay however long after it arrives.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const table of ['scores', 'sheet_notes']) {
    // Lines written before this migration came from phones without an id: each is its own device.
    await qi.addColumn(table, 'device_id', { type: DataTypes.UUID, allowNull: true });
    await qi.addColumn(table, 'device_seq', { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 });
    await qi.addColumn(table, 'received_at', { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW });
  }
  await qi.createTable(
    'score_receipts',
    {
      client_id: { type: DataTypes.UUID, primaryKey: true },
      judge_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
      received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
  );
  await qi.sequelize.query('INSERT INTO score_receipts (client_id, judge_id, received_at) SELECT client_id, judge_id, updated_at FROM scores UNION ALL SELECT client_id, judge_id, updated_at FROM sheet_notes ON CONFLICT DO NOTHING');
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.dropTable('score_receipts');
  for (const table of ['scores', 'sheet_notes']) {
    for (const column of ['device_id', 'device_seq', 'received_at']) await qi.removeColumn(table, column);
  }
};
