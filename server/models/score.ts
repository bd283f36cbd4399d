import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One judge's points for one line of the sheet of one car; the server decides which value is newest (services/judging/scores.ts). */
export class Score extends Model<InferAttributes<Score>, InferCreationAttributes<Score>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare entryId: number;
  declare judgeId: number;
  declare criterionId: number;
  declare points: number;
  declare comment: string;
  declare deviceTime: Date;
  declare clientId: string;
  /** The phone the stored value came from (null: sent by a phone that gave no id). */
  declare deviceId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Score.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        judgeId: { type: DataTypes.INTEGER, allowNull: false },
        criterionId: { type: DataTypes.INTEGER, allowNull: false },
        points: { type: DataTypes.INTEGER, allowNull: false },
        comment: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
        deviceTime: { type: DataTypes.DATE, allowNull: false },
        clientId: { type: DataTypes.UUID, allowNull: false },
        deviceId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'scores', underscored: true },
    );
  }
}
