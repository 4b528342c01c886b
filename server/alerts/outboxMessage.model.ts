import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { jsonText } from './jsonText';

export type OutboxKind = 'alerts' | 'digest';
export type OutboxStatus = 'pending' | 'sent' | 'failed';

/** One e-mail to one recipient, written with the change it reports and delivered later by the sender. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare kind: OutboxKind;
  declare userId: number | null;
  declare toAddress: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  /** Fixed at write time so every attempt, by any instance, carries the same Message-ID header. */
  declare messageId: string;
  declare alertIds: number[];
  declare status: CreationOptional<OutboxStatus>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare claimedBy: CreationOptional<string | null>;
  declare claimedUntil: CreationOptional<Date | null>;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        toAddress: { type: DataTypes.STRING(190), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        textBody: { type: DataTypes.TEXT('medium'), allowNull: false },
        htmlBody: { type: DataTypes.TEXT('medium'), allowNull: false },
        messageId: { type: DataTypes.STRING(200), allowNull: false },
        alertIds: jsonText<number[]>('alertIds'),
        status: { type: DataTypes.ENUM('pending', 'sent', 'failed'), allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
        claimedBy: { type: DataTypes.STRING(80), allowNull: true },
        claimedUntil: { type: DataTypes.DATE(3), allowNull: true },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'outbox' },
    );
  }
}
