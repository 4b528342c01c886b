import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { BatchStatus } from '../../shared/schemas/batches';

/** The grafts made on one day of one species: scion on one rootstock, by one method, stored in one medium. */
export class Batch extends Model<InferAttributes<Batch>, InferCreationAttributes<Batch>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare code: string;
  declare speciesKey: string;
  declare scionCultivar: string;
  declare rootstock: string;
  declare method: string;
  declare graftCount: number;
  /** YYYY-MM-DD on the nursery's calendar. */
  declare graftedOn: string;
  declare grafter: string;
  declare storageMedium: string;
  declare notes: string;
  declare status: CreationOptional<BatchStatus>;
  /** When it was planted out or discarded; null while in storage. */
  declare leftAt: CreationOptional<Date | null>;
  declare leftNote: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Batch.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        code: { type: DataTypes.STRING(40), allowNull: false },
        speciesKey: { type: DataTypes.STRING(40), allowNull: false },
        scionCultivar: { type: DataTypes.STRING(120), allowNull: false },
        rootstock: { type: DataTypes.STRING(120), allowNull: false },
        method: { type: DataTypes.STRING(60), allowNull: false },
        graftCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        graftedOn: { type: DataTypes.DATEONLY, allowNull: false },
        grafter: { type: DataTypes.STRING(120), allowNull: false },
        storageMedium: { type: DataTypes.STRING(80), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.ENUM('in_storage', 'planted_out', 'discarded'), allowNull: false, defaultValue: 'in_storage' },
        leftAt: { type: DataTypes.DATE(3), allowNull: true },
        leftNote: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'batches' },
    );
  }
}
