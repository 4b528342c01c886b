import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { placementColumns } from '../db/placementColumns';

/** Which room a batch sat in, from when to when; `placedTo` null means it is there now. */
export class BatchPlacement extends Model<InferAttributes<BatchPlacement>, InferCreationAttributes<BatchPlacement>> {
  declare id: CreationOptional<number>;
  declare batchId: number;
  declare roomId: number;
  declare placedFrom: Date;
  declare placedTo: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BatchPlacement.init(
      placementColumns('batchId'),
      { sequelize, tableName: 'batch_placements' },
    );
  }
}
