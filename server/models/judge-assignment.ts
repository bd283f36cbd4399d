import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A class a judge scores in one show; `classId` null means every class. */
export class JudgeAssignment extends Model<InferAttributes<JudgeAssignment>, InferCreationAttributes<JudgeAssignment>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare judgeId: number;
  declare classId: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    JudgeAssignment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        judgeId: { type: DataTypes.INTEGER, allowNull: false },
        classId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'judge_assignments', underscored: true, updatedAt: false },
    );
  }
}
