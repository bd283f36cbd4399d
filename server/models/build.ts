import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Credit } from '@shared/schemas/build';
import type { FigureInput } from '@shared/schemas/figure';
import type { User } from './user';
import type { BuildSection } from './build-section';
import type { Photo } from './photo';
import type { DynoRun } from './dyno-run';
import type { WeighIn } from './weigh-in';
import type { FigureChange } from './figure-change';

export class Build extends Model<InferAttributes<Build>, InferCreationAttributes<Build>> {
  declare id: CreationOptional<number>;
  declare ownerId: ForeignKey<User['id']>;
  declare code: string;
  declare title: string;
  declare modelYear: number | null;
  declare bodyOrigin: string | null;
  declare style: string | null;
  declare story: CreationOptional<string>;
  declare weight: FigureInput | null;
  declare credits: CreationOptional<Credit[]>;
  declare cardSettings: CreationOptional<Record<string, unknown> | null>;
  declare published: CreationOptional<boolean>;
  // Private fields: presenters for the public never read these.
  declare vin: string | null;
  declare plate: string | null;
  declare ownerPhone: string | null;
  declare ownerAddress: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare owner?: NonAttribute<User>;
  declare sections?: NonAttribute<BuildSection[]>;
  declare photos?: NonAttribute<Photo[]>;
  declare dynoRuns?: NonAttribute<DynoRun[]>;
  declare weighIns?: NonAttribute<WeighIn[]>;
  declare figureChanges?: NonAttribute<FigureChange[]>;

  static initModel(sequelize: Sequelize) {
    Build.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        code: { type: DataTypes.STRING(8), allowNull: false, unique: true },
        title: { type: DataTypes.STRING(120), allowNull: false },
        modelYear: { type: DataTypes.INTEGER, allowNull: true },
        bodyOrigin: { type: DataTypes.STRING(200), allowNull: true },
        style: { type: DataTypes.STRING(40), allowNull: true },
        story: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        weight: { type: DataTypes.JSONB, allowNull: true },
        credits: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        cardSettings: { type: DataTypes.JSONB, allowNull: true },
        published: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        vin: { type: DataTypes.STRING(40), allowNull: true },
        plate: { type: DataTypes.STRING(20), allowNull: true },
        ownerPhone: { type: DataTypes.STRING(40), allowNull: true },
        ownerAddress: { type: DataTypes.STRING(400), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'builds', underscored: true },
    );
  }
}
