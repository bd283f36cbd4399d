import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator';

// Money that arrived but did not simply pay an entry's fee (a wrong amount or currency, a checkout
// not opened for the entry, a second payment of a paid entry) is kept here for the organiser, never
// dropped; a second payment is refunded and the refund's state lives on the row. An entry's own
// refund gets its amount beside the reference and date it already had.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.createTable('payment_issues', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    event_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'events', key: 'id' }, onDelete: 'CASCADE' },
    entry_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'entries', key: 'id' }, onDelete: 'CASCADE' },
    reason: { type: DataTypes.STRING(30), allowNull: false },
    checkout_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    payment_intent_id: { type: DataTypes.STRING(255), allowNull: true },
    amount: { type: DataTypes.INTEGER, allowNull: false },
    currency: { type: DataTypes.STRING(3), allowNull: false },
    webhook_event_id: { type: DataTypes.STRING(255), allowNull: false },
    refund_amount: { type: DataTypes.INTEGER, allowNull: true },
    refund_ref: { type: DataTypes.STRING(255), allowNull: true },
    refunded_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('payment_issues', ['entry_id']);
  await qi.sequelize.query(`ALTER TABLE payment_issues
    ADD CONSTRAINT payment_issues_reason CHECK (reason IN ('wrong_amount', 'wrong_currency', 'foreign_checkout', 'paid_twice')),
    ADD CONSTRAINT payment_issues_amount CHECK (amount >= 0),
    ADD CONSTRAINT payment_issues_refund CHECK (refund_amount IS NULL OR (refund_amount > 0 AND refund_amount <= amount)),
    ADD CONSTRAINT payment_issues_refund_sent CHECK ((refund_ref IS NULL) = (refunded_at IS NULL))`);

  await qi.addColumn('entries', 'refunded_amount', { type: DataTypes.INTEGER, allowNull: true });
  await qi.sequelize.query('UPDATE entries SET refunded_amount = refund_due WHERE refund_ref IS NOT NULL');
  await qi.sequelize.query(`ALTER TABLE entries ADD CONSTRAINT entries_refunded_amount CHECK (refunded_amount IS NULL OR (refunded_amount > 0 AND refunded_amount <= paid_amount))`);
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query('ALTER TABLE entries DROP CONSTRAINT entries_refunded_amount');
  await qi.removeColumn('entries', 'refunded_amount');
  await qi.dropTable('payment_issues');
};
