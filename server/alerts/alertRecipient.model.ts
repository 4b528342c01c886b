import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A user who was told an alert opened; reminders and the resolved message go to these users. */
export class AlertRecipient extends Model<InferAttributes<AlertRecipient>, InferCreationAttributes<AlertRecipient>> {
  declare alertId: number;
  declare userId: number;
  declare notifiedAt: Date;

  static initModel(sequelize: Sequelize) {
    AlertRecipient.init(
      {
        alertId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        notifiedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'alert_recipients', timestamps: false },
    );
  }
}
