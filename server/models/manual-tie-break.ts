import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The organiser's order for cars the rules left tied, best first, with the recorded reason. */
export class ManualTieBreak extends Model<InferAttributes<ManualTieBreak>, InferCreationAttributes<ManualTieBreak>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare entryIds: number[];
  declare reason: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ManualTieBreak.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryIds: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false },
        reason: { type: DataTypes.STRING(500), allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'manual_tie_breaks', underscored: true, updatedAt: false },
    );
  }
}
