import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { FigureInput } from '@shared/schemas/figure';
import type { Build } from './build';

/** A figure's earlier value, kept when it is replaced (say, an estimate by a measurement). */
export class FigureChange extends Model<InferAttributes<FigureChange>, InferCreationAttributes<FigureChange>> {
  declare id: CreationOptional<number>;
  declare buildId: ForeignKey<Build['id']>;
  declare path: string;
  declare before: FigureInput;
  declare after: FigureInput | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FigureChange.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        path: { type: DataTypes.STRING(120), allowNull: false },
        before: { type: DataTypes.JSONB, allowNull: false },
        after: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'figure_changes', underscored: true },
    );
  }
}
