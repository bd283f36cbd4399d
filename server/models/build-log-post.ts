import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { LogStatus } from '@shared/schemas/build-log';
import type { Build } from './build';
import type { DynoRun } from './dyno-run';
import type { WeighIn } from './weigh-in';

/** A dated post in a build's log; `photoIds` name photos of the same build, in the order shown. */
export class BuildLogPost extends Model<InferAttributes<BuildLogPost>, InferCreationAttributes<BuildLogPost>> {
  declare id: CreationOptional<number>;
  declare buildId: ForeignKey<Build['id']>;
  declare postedOn: string;
  declare title: string;
  declare body: string;
  declare status: LogStatus;
  declare photoIds: number[];
  declare dynoRunId: ForeignKey<DynoRun['id']> | null;
  declare weighInId: ForeignKey<WeighIn['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BuildLogPost.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        postedOn: { type: DataTypes.DATEONLY, allowNull: false },
        title: { type: DataTypes.TEXT, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false },
        photoIds: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false },
        dynoRunId: { type: DataTypes.INTEGER, allowNull: true },
        weighInId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'build_log_posts', underscored: true },
    );
  }
}
