import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Build } from './build';

/** A question about a build: waiting while `answer` is null, answered once it has one. Nothing about who asked is kept. */
export class BuildQuestion extends Model<InferAttributes<BuildQuestion>, InferCreationAttributes<BuildQuestion>> {
  declare id: CreationOptional<number>;
  declare buildId: ForeignKey<Build['id']>;
  declare question: string;
  declare answer: string | null;
  declare askedCount: CreationOptional<number>;
  declare fromVisitor: CreationOptional<boolean>;
  declare answeredAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BuildQuestion.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        question: { type: DataTypes.TEXT, allowNull: false },
        answer: { type: DataTypes.TEXT, allowNull: true },
        askedCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        fromVisitor: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        answeredAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'build_questions', underscored: true },
    );
  }
}
