import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { AlertThresholds } from '../../shared/schemas/alerts';
import { jsonText } from './jsonText';

/** Stored threshold overrides: the nursery's (roomId null) or one room's. Missing keys fall back. */
export class AlertSetting extends Model<InferAttributes<AlertSetting>, InferCreationAttributes<AlertSetting>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare roomId: number | null;
  declare thresholds: Partial<AlertThresholds>;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AlertSetting.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        roomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        thresholds: jsonText<Partial<AlertThresholds>>('thresholds'),
        updatedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'alert_settings' },
    );
  }
}
