import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// Which worker process holds a running print (host and process id), for whoever looks at a stuck print;
// and the card queue its jobs go to ('cards'; under test one per storage), so a worker's sweep puts a
// print whose worker died back on the queue it came from.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.addColumn('card_prints', 'held_by', { type: DataTypes.STRING(120), allowNull: true });
  await qi.addColumn('card_prints', 'queue', { type: DataTypes.STRING(60), allowNull: false, defaultValue: 'cards' });
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.removeColumn('card_prints', 'queue');
  await qi.removeColumn('card_prints', 'held_by');
};
