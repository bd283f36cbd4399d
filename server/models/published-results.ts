import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ResultsSnapshot } from '@shared/schemas/results';

/** A show's results as published: read by the public page, PDFs and owners; never recomputed. */
export class PublishedResults extends Model<InferAttributes<PublishedResults>, InferCreationAttributes<PublishedResults>> {
  declare eventId: number;
  declare results: ResultsSnapshot;
  declare publishedBy: number | null;
  declare publishedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PublishedResults.init(
      {
        eventId: { type: DataTypes.INTEGER, primaryKey: true },
        results: { type: DataTypes.JSONB, allowNull: false },
        publishedBy: { type: DataTypes.INTEGER, allowNull: true },
        publishedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'published_results', underscored: true, timestamps: false },
    );
  }
}
