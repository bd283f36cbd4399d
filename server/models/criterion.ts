import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One line of a show's judging sheet. */
export class Criterion extends Model<InferAttributes<Criterion>, InferCreationAttributes<Criterion>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare name: string;
  declare maxPoints: number;
  declare weight: number;
  declare tieBreakOrder: number | null;
  declare position: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Criterion.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        maxPoints: { type: DataTypes.INTEGER, allowNull: false },
        // DECIMAL arrives from pg as a string; read it as a number.
        weight: {
          type: DataTypes.DECIMAL(6, 2),
          allowNull: false,
          get(this: Criterion) {
            return Number(this.getDataValue('weight'));
          },
        },
        tieBreakOrder: { type: DataTypes.INTEGER, allowNull: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'criteria', underscored: true },
    );
  }
}
