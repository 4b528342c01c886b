import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { placementColumns } from '../db/placementColumns';

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
      placementColumns('loggerId'),
      { sequelize, tableName: 'logger_placements' },
    );
  }
}
