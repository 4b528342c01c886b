import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Logger extends Model<InferAttributes<Logger>, InferCreationAttributes<Logger>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare label: string;
  declare serial: string;
  declare notes: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Logger.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        label: { type: DataTypes.STRING(60), allowNull: false },
        serial: { type: DataTypes.STRING(80), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'loggers' },
    );
  }
}
