import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message the demo-mode SMTP catcher received (kept in the database so any server process can show it). */
export class CaughtMail extends Model<InferAttributes<CaughtMail>, InferCreationAttributes<CaughtMail>> {
  declare id: CreationOptional<number>;
  declare from: string;
  declare to: string;
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CaughtMail.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        from: { type: DataTypes.TEXT, allowNull: false },
        to: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'caught_mails', underscored: true },
    );
  }
}
