import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { WeighInCreateInput } from '@shared/schemas/build';
import type { Build } from './build';

/** Stored whole as checked by the shared schema; `date` is kept apart to sort by. */
export class WeighIn extends Model<InferAttributes<WeighIn>, InferCreationAttributes<WeighIn>> {
  declare id: CreationOptional<number>;
  declare buildId: ForeignKey<Build['id']>;
  declare date: string;
  declare data: WeighInCreateInput;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    WeighIn.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        data: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'weigh_ins', underscored: true },
    );
  }
}
