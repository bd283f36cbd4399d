import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Entry } from './entry';

/** A visitor's people's choice vote: the voter and the address are stored only as keyed hashes. */
export class Vote extends Model<InferAttributes<Vote>, InferCreationAttributes<Vote>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare entryId: number;
  declare voterHash: string;
  declare addressHash: string;
  declare voidedAt: CreationOptional<Date | null>;
  declare voidedBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;

  declare entry?: NonAttribute<Entry>;

  static initModel(sequelize: Sequelize) {
    Vote.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        voterHash: { type: DataTypes.CHAR(64), allowNull: false },
        addressHash: { type: DataTypes.CHAR(64), allowNull: false },
        voidedAt: { type: DataTypes.DATE, allowNull: true },
        voidedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'votes', underscored: true, updatedAt: false },
    );
  }
}
