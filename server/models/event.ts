import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { AskablePrivateField, EventStatus } from '@shared/constants';
import type { RefundRule } from '@shared/calc/refund';
import { DEFAULT_RESULT_RULES, type ShowResultRules } from '@shared/schemas/judging';
import type { EventClass } from './event-class';
import type { Criterion } from './criterion';

/** A show. Instants are stored in UTC; `timeZone` says how to show them. */
export type EventLogo = { storageKey: string; variants: Array<{ width: number; height: number }> };

export class Event extends Model<InferAttributes<Event>, InferCreationAttributes<Event>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare slug: string;
  declare status: CreationOptional<EventStatus>;
  declare venueName: string;
  declare venueAddress: string;
  declare timeZone: string;
  declare startsAt: Date;
  declare endsAt: Date;
  declare registrationOpensAt: Date;
  declare registrationClosesAt: Date;
  declare capacity: number | null;
  declare entryFee: number;
  declare currency: string;
  declare refundRule: RefundRule;
  declare description: string;
  declare asksFor: CreationOptional<AskablePrivateField[]>;
  declare lastEntryNumber: CreationOptional<number>;
  declare createdBy: number | null;
  declare judgingClosedAt: CreationOptional<Date | null>;
  declare resultRules: CreationOptional<ShowResultRules>;
  /** The show's logo, stored as build photos are (same keys and widths); null when it has none. */
  declare logo: CreationOptional<EventLogo | null>;
  declare peoplesChoiceOpenedAt: CreationOptional<Date | null>;
  declare peoplesChoiceClosedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare classes?: NonAttribute<EventClass[]>;
  declare criteria?: NonAttribute<Criterion[]>;

  static initModel(sequelize: Sequelize) {
    Event.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
        status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
        venueName: { type: DataTypes.STRING(200), allowNull: false },
        venueAddress: { type: DataTypes.STRING(400), allowNull: false, defaultValue: '' },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        startsAt: { type: DataTypes.DATE, allowNull: false },
        endsAt: { type: DataTypes.DATE, allowNull: false },
        registrationOpensAt: { type: DataTypes.DATE, allowNull: false },
        registrationClosesAt: { type: DataTypes.DATE, allowNull: false },
        capacity: { type: DataTypes.INTEGER, allowNull: true },
        entryFee: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        currency: { type: DataTypes.STRING(3), allowNull: false },
        refundRule: { type: DataTypes.JSONB, allowNull: false },
        asksFor: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        lastEntryNumber: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        judgingClosedAt: { type: DataTypes.DATE, allowNull: true },
        resultRules: { type: DataTypes.JSONB, allowNull: false, defaultValue: DEFAULT_RESULT_RULES },
        logo: { type: DataTypes.JSONB, allowNull: true },
        peoplesChoiceOpenedAt: { type: DataTypes.DATE, allowNull: true },
        peoplesChoiceClosedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'events', underscored: true },
    );
  }
}
