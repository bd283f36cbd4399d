import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { EventRole } from '@shared/constants';
import type { Event } from './event';
import type { User } from './user';

/** A single-use, expiring link giving a role in one show; only the SHA-256 of the token is stored. */
export class EventInvitation extends Model<InferAttributes<EventInvitation>, InferCreationAttributes<EventInvitation>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare email: string;
  declare role: EventRole;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedBy: CreationOptional<number | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare invitedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare event?: NonAttribute<Event>;
  declare inviter?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    EventInvitation.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        acceptedBy: { type: DataTypes.INTEGER, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        invitedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'event_invitations', underscored: true },
    );
  }
}
