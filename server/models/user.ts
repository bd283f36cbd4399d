import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  /** Public words the owner chooses to show beside their name on results; null when not given. */
  declare hometown: CreationOptional<string | null>;
  declare club: CreationOptional<string | null>;
  declare passwordHash: string;
  declare isSiteAdmin: CreationOptional<boolean>;
  declare mayOrganise: CreationOptional<boolean>;
  /** Set by a site admin: the account cannot sign in and its public pages are offline. */
  declare disabledAt: CreationOptional<Date | null>;
  declare lastSignInAt: CreationOptional<Date | null>;
  /** When the person followed the confirmation link; null until then. */
  declare emailVerifiedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** The policies read this (Actor.emailVerified): an unconfirmed account cannot take part in shows. */
  get emailVerified(): NonAttribute<boolean> {
    return this.emailVerifiedAt != null;
  }

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        hometown: { type: DataTypes.STRING(80), allowNull: true },
        club: { type: DataTypes.STRING(80), allowNull: true },
        passwordHash: { type: DataTypes.STRING(255), allowNull: false },
        isSiteAdmin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        mayOrganise: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        disabledAt: { type: DataTypes.DATE, allowNull: true },
        lastSignInAt: { type: DataTypes.DATE, allowNull: true },
        emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', underscored: true },
    );
  }
}
