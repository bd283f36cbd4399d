import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { EventRole } from '@shared/constants';
import type { User } from './user';
import type { Event } from './event';

/** A person's role in one show. */
export class EventMembership extends Model<InferAttributes<EventMembership>, InferCreationAttributes<EventMembership>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare userId: number;
  declare role: EventRole;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;
  declare event?: NonAttribute<Event>;

  static initModel(sequelize: Sequelize) {
    EventMembership.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'event_memberships', underscored: true },
    );
  }
}
