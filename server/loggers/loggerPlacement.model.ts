import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Which room a logger was in, from when to when; `placedTo` null means it is there now. */
export class LoggerPlacement extends Model<InferAttributes<LoggerPlacement>, InferCreationAttributes<LoggerPlacement>> {
  declare id: CreationOptional<number>;
  declare loggerId: number;
  declare roomId: number;
  declare placedFrom: Date;
  declare placedTo: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    LoggerPlacement.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        loggerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        roomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        placedFrom: { type: DataTypes.DATE(3), allowNull: false },
        placedTo: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'logger_placements' },
    );
  }
}
