import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CardPrintStatus } from '@shared/schemas/card-print';
import type { EventClass } from './event-class';
import type { User } from './user';

/** One bulk print of a show's numbered cards (every confirmed entry, or one class): the job's progress and its file. */
export class CardPrint extends Model<InferAttributes<CardPrint>, InferCreationAttributes<CardPrint>> {
  declare id: CreationOptional<number>;
  declare eventId: number;
  declare classId: number | null;
  declare status: CreationOptional<CardPrintStatus>;
  declare done: CreationOptional<number>;
  declare total: number;
  declare rendered: CreationOptional<number>;
  declare fileKey: CreationOptional<string | null>;
  declare error: CreationOptional<string | null>;
  declare startedBy: number;
  declare finishedAt: CreationOptional<Date | null>;
  /** The last beat of the worker run holding a running print, and that run's token. */
  declare heartbeatAt: CreationOptional<Date | null>;
  declare workerToken: CreationOptional<string | null>;
  /** The worker process (`host:pid`) holding a running print, or that printed a finished one. */
  declare heldBy: CreationOptional<string | null>;
  /** The card queue its jobs go to ('cards'; under test, the queue of the storage the print is drawn into). */
  declare queue: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare starter?: NonAttribute<User>;
  declare eventClass?: NonAttribute<EventClass>;

  static initModel(sequelize: Sequelize) {
    CardPrint.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        classId: { type: DataTypes.INTEGER, allowNull: true },
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'queued' },
        done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        total: { type: DataTypes.INTEGER, allowNull: false },
        rendered: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        fileKey: { type: DataTypes.STRING(200), allowNull: true },
        error: { type: DataTypes.STRING(500), allowNull: true },
        startedBy: { type: DataTypes.INTEGER, allowNull: false },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        heartbeatAt: { type: DataTypes.DATE, allowNull: true },
        workerToken: { type: DataTypes.UUID, allowNull: true },
        heldBy: { type: DataTypes.STRING(120), allowNull: true },
        queue: { type: DataTypes.STRING(60), allowNull: false, defaultValue: 'cards' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'card_prints', underscored: true },
    );
  }
}
