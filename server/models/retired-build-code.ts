import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The code of a deleted build, so it is never handed out again. */
export class RetiredBuildCode extends Model<InferAttributes<RetiredBuildCode>, InferCreationAttributes<RetiredBuildCode>> {
  declare code: string;
  declare retiredAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RetiredBuildCode.init(
      { code: { type: DataTypes.STRING(8), primaryKey: true }, retiredAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW } },
      { sequelize, tableName: 'retired_build_codes', underscored: true, timestamps: false },
    );
  }
}
