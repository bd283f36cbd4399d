import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SectionKind } from '@shared/schemas/build-sections';
import type { Build } from './build';

/** One spec section of a build, saved on its own; `data` is checked by the section's shared schema. */
export class BuildSection extends Model<InferAttributes<BuildSection>, InferCreationAttributes<BuildSection>> {
  declare id: CreationOptional<number>;
  declare buildId: ForeignKey<Build['id']>;
  declare kind: SectionKind;
  declare data: Record<string, unknown>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BuildSection.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'build_sections', underscored: true },
    );
  }
}
