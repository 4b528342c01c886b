import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The local day a nursery's digest was written for; its key lets only one instance write each day's digest. */
export class AlertDigest extends Model<InferAttributes<AlertDigest>, InferCreationAttributes<AlertDigest>> {
  declare nurseryId: number;
  /** YYYY-MM-DD on the nursery's calendar. */
  declare localDate: string;
  declare createdAt: Date;

  static initModel(sequelize: Sequelize) {
    AlertDigest.init(
      {
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        localDate: { type: DataTypes.DATEONLY, primaryKey: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'alert_digests', timestamps: false },
    );
  }
}
