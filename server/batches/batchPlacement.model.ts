import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

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
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        batchId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        roomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        placedFrom: { type: DataTypes.DATE(3), allowNull: false },
        placedTo: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'batch_placements' },
    );
  }
}
