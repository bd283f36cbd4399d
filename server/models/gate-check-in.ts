import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const GATE_CHECK_IN_OUTCOMES = ['checked_in', 'already_checked_in'] as const;

/** One check-in a gate phone queued with no signal, kept by the phone's id for it so a replay changes nothing. */
export class GateCheckIn extends Model<InferAttributes<GateCheckIn>, InferCreationAttributes<GateCheckIn>> {
  declare clientId: string;
  declare eventId: number;
  declare entryId: number;
  declare deviceId: string;
  declare sequence: number;
  declare deviceTime: Date;
  declare actorId: number | null;
  declare outcome: (typeof GATE_CHECK_IN_OUTCOMES)[number];
  declare cashTaken: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    GateCheckIn.init(
      {
        clientId: { type: DataTypes.UUID, primaryKey: true },
        eventId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        deviceId: { type: DataTypes.UUID, allowNull: false },
        sequence: { type: DataTypes.INTEGER, allowNull: false },
        deviceTime: { type: DataTypes.DATE, allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        outcome: { type: DataTypes.TEXT, allowNull: false },
        cashTaken: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'gate_check_ins', underscored: true, updatedAt: false },
    );
  }
}
