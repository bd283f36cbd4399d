import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from './user';

/** Who changed what in a show, when, before → after. Written in the same transaction as the change. */
export class AuditLine extends Model<InferAttributes<AuditLine>, InferCreationAttributes<AuditLine>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare entryId: number | null;
  declare actorId: number | null;
  declare action: string;
  declare before: unknown;
  declare after: unknown;
  declare createdAt: CreationOptional<Date>;

  declare actor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    AuditLine.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: true },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(40), allowNull: false },
        before: { type: DataTypes.JSONB, allowNull: true },
        after: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_lines', underscored: true, updatedAt: false },
    );
  }
}
