import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { AlertRule, Severity, SubjectKind } from '../../shared/alerts/rules';
import type { FindingDetail } from '../../shared/alerts/types';
import type { AlertStatus } from '../../shared/schemas/alerts';
import { jsonText } from './jsonText';

/** Why an alert ended: its condition cleared, or its subject is no longer watched (emptied room, batch planted out). */
export type AlertResolution = 'cleared' | 'unwatched';

/** One alert per (rule, subject) while its condition holds: open → acknowledged → resolved. */
export class Alert extends Model<InferAttributes<Alert>, InferCreationAttributes<Alert>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare rule: AlertRule;
  declare subjectKind: SubjectKind;
  declare subjectId: number;
  declare subjectName: string;
  declare roomId: number | null;
  declare severity: Severity;
  declare status: AlertStatus;
  /** When the condition began, in data time (the first reading of its run). */
  declare since: Date | null;
  declare openedAt: Date;
  declare acknowledgedAt: CreationOptional<Date | null>;
  declare acknowledgedBy: CreationOptional<number | null>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare resolution: CreationOptional<AlertResolution | null>;
  /** When recipients were last written to about it (opening or reminder); reminders count from here. */
  declare lastNotifiedAt: CreationOptional<Date | null>;
  declare remindersSent: CreationOptional<number>;
  /** The latest figures: value, trend, limits, batches at stake. */
  declare detail: FindingDetail;
  /** The evaluation that last saw it. */
  declare checkedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Alert.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        rule: { type: DataTypes.STRING(32), allowNull: false },
        subjectKind: { type: DataTypes.STRING(10), allowNull: false },
        subjectId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        subjectName: { type: DataTypes.STRING(250), allowNull: false },
        roomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        severity: { type: DataTypes.ENUM('warning', 'critical'), allowNull: false },
        status: { type: DataTypes.ENUM('open', 'acknowledged', 'resolved'), allowNull: false },
        since: { type: DataTypes.DATE(3), allowNull: true },
        openedAt: { type: DataTypes.DATE(3), allowNull: false },
        acknowledgedAt: { type: DataTypes.DATE(3), allowNull: true },
        acknowledgedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        resolvedAt: { type: DataTypes.DATE(3), allowNull: true },
        resolution: { type: DataTypes.STRING(20), allowNull: true },
        lastNotifiedAt: { type: DataTypes.DATE(3), allowNull: true },
        remindersSent: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        detail: jsonText<FindingDetail>('detail'),
        checkedAt: { type: DataTypes.DATE(3), allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'alerts' },
    );
  }
}
