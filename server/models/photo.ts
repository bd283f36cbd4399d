import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Build } from './build';

/** One stored size of a photo; each exists as WebP and JPEG under `<storageKey>-<width>.<ext>`. */
export type PhotoVariant = { width: number; height: number };

export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare buildId: ForeignKey<Build['id']>;
  declare storageKey: string;
  declare caption: CreationOptional<string>;
  declare position: CreationOptional<number>;
  declare isCover: CreationOptional<boolean>;
  declare width: number;
  declare height: number;
  declare variants: PhotoVariant[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Photo.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        storageKey: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        isCover: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        variants: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos', underscored: true },
    );
  }
}
