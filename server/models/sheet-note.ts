import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A judge's comment on a whole car (beside the per-line comments on scores); newest device time wins. */
export class SheetNote extends Model<InferAttributes<SheetNote>, InferCreationAttributes<SheetNote>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare entryId: number;
  declare judgeId: number;
  declare comment: string;
  declare deviceTime: Date;
  declare clientId: string;
  /** The phone the stored value came from (null: sent by a phone that gave no id). */
  declare deviceId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SheetNote.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        judgeId: { type: DataTypes.INTEGER, allowNull: false },
        comment: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
        deviceTime: { type: DataTypes.DATE, allowNull: false },
        clientId: { type: DataTypes.UUID, allowNull: false },
        deviceId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sheet_notes', underscored: true },
    );
  }
}
