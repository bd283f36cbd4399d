import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';

/** A class of a show (name, order, optional capacity). */
export class EventClass extends Model<InferAttributes<EventClass>, InferCreationAttributes<EventClass>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare name: string;
  declare description: string;
  declare position: number;
  declare capacity: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Not stored: places left (null = no limit), filled by `loadPublicEvent` for the public show page and its JSON. */
  declare placesLeft?: NonAttribute<number | null>;

  static initModel(sequelize: Sequelize) {
    EventClass.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        description: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        capacity: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'event_classes', underscored: true },
    );
  }
}
