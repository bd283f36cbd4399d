import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { AskablePrivateField, EntryStatus } from '@shared/constants';
import type { Build } from './build';
import type { Event } from './event';
import type { EventClass } from './event-class';
import type { PaymentIssue } from './payment-issue';
import type { User } from './user';

/** A build entered in a show. Money in integer minor units of `currency`. */
export class Entry extends Model<InferAttributes<Entry>, InferCreationAttributes<Entry>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare buildId: number;
  declare classId: number;
  declare ownerId: number;
  declare number: CreationOptional<number | null>;
  declare status: EntryStatus;
  declare feeAmount: number;
  declare currency: string;
  declare paymentRef: CreationOptional<string | null>;
  declare paidAt: CreationOptional<Date | null>;
  declare paidAmount: CreationOptional<number | null>;
  declare refundDue: CreationOptional<number | null>;
  /** The payment service's checkout for this entry's fee, and how many were opened (each new one gets a new idempotency key). */
  declare checkoutId: CreationOptional<string | null>;
  declare checkoutAttempt: CreationOptional<number>;
  /** The refund the payment service made after a withdrawal; a refund of a cash payment is the organiser's to hand back. */
  declare refundRef: CreationOptional<string | null>;
  declare refundedAt: CreationOptional<Date | null>;
  /** What that refund gave back (minor units); never more than was paid. */
  declare refundedAmount: CreationOptional<number | null>;
  declare withdrawnAt: CreationOptional<Date | null>;
  declare waitlistedAt: CreationOptional<Date | null>;
  declare offerExpiresAt: CreationOptional<Date | null>;
  declare checkedInAt: CreationOptional<Date | null>;
  /** A walk-up entered at the gate: the entrant's name and e-mail as given there (the account is the organiser's). Private. */
  declare walkUpName: CreationOptional<string | null>;
  declare walkUpEmail: CreationOptional<string | null>;
  /** The private build fields the entrant agreed to share with the show's organisers when entering. */
  declare sharedFields: CreationOptional<AskablePrivateField[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare build?: NonAttribute<Build>;
  declare event?: NonAttribute<Event>;
  declare eventClass?: NonAttribute<EventClass>;
  declare owner?: NonAttribute<User>;
  /** Loaded for the organiser's table and CSV: payments that need their attention. */
  declare paymentIssues?: NonAttribute<PaymentIssue[]>;

  static initModel(sequelize: Sequelize) {
    Entry.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        buildId: { type: DataTypes.INTEGER, allowNull: false },
        classId: { type: DataTypes.INTEGER, allowNull: false },
        ownerId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: true },
        status: { type: DataTypes.STRING(20), allowNull: false },
        feeAmount: { type: DataTypes.INTEGER, allowNull: false },
        currency: { type: DataTypes.STRING(3), allowNull: false },
        paymentRef: { type: DataTypes.STRING(255), allowNull: true },
        paidAt: { type: DataTypes.DATE, allowNull: true },
        paidAmount: { type: DataTypes.INTEGER, allowNull: true },
        refundDue: { type: DataTypes.INTEGER, allowNull: true },
        checkoutId: { type: DataTypes.STRING(255), allowNull: true },
        checkoutAttempt: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        refundRef: { type: DataTypes.STRING(255), allowNull: true },
        refundedAt: { type: DataTypes.DATE, allowNull: true },
        refundedAmount: { type: DataTypes.INTEGER, allowNull: true },
        withdrawnAt: { type: DataTypes.DATE, allowNull: true },
        waitlistedAt: { type: DataTypes.DATE, allowNull: true },
        offerExpiresAt: { type: DataTypes.DATE, allowNull: true },
        checkedInAt: { type: DataTypes.DATE, allowNull: true },
        walkUpName: { type: DataTypes.TEXT, allowNull: true },
        walkUpEmail: { type: DataTypes.TEXT, allowNull: true },
        sharedFields: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'entries', underscored: true },
    );
  }
}
