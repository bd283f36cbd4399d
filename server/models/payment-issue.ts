import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { PaymentIssueReason } from '@shared/schemas/show-day';

/**
 * A payment that reached an entry but did not simply pay its fee, kept for the organiser's attention.
 * Money in integer minor units of `currency` (what the payment service took, which may not be the fee's).
 */
export class PaymentIssue extends Model<InferAttributes<PaymentIssue>, InferCreationAttributes<PaymentIssue>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare entryId: number;
  declare reason: PaymentIssueReason;
  declare checkoutId: string;
  declare paymentIntentId: string | null;
  declare amount: number;
  declare currency: string;
  declare webhookEventId: string;
  /** The refund of this payment, once sent: amount, the payment service's reference and when. */
  declare refundAmount: CreationOptional<number | null>;
  declare refundRef: CreationOptional<string | null>;
  declare refundedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PaymentIssue.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.STRING(30), allowNull: false },
        checkoutId: { type: DataTypes.STRING(255), allowNull: false },
        paymentIntentId: { type: DataTypes.STRING(255), allowNull: true },
        amount: { type: DataTypes.INTEGER, allowNull: false },
        currency: { type: DataTypes.STRING(3), allowNull: false },
        webhookEventId: { type: DataTypes.STRING(255), allowNull: false },
        refundAmount: { type: DataTypes.INTEGER, allowNull: true },
        refundRef: { type: DataTypes.STRING(255), allowNull: true },
        refundedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'payment_issues', underscored: true },
    );
  }
}
