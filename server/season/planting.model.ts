import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ExposureSnapshot } from '../../shared/season/types';

/** Part (or all) of a batch planted out on one day into one bed or field, with its storage figures frozen. */
export class Planting extends Model<InferAttributes<Planting>, InferCreationAttributes<Planting>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare batchId: number;
  /** YYYY-MM-DD on the nursery's calendar. */
  declare plantedOn: string;
  declare graftCount: number;
  declare location: string;
  declare notes: CreationOptional<string>;
  declare exposureSnapshot: ExposureSnapshot;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Planting.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        batchId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        plantedOn: { type: DataTypes.DATEONLY, allowNull: false },
        graftCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        location: { type: DataTypes.STRING(120), allowNull: false },
        notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
        exposureSnapshot: {
          type: DataTypes.TEXT('long'),
          allowNull: false,
          get() {
            return JSON.parse(this.getDataValue('exposureSnapshot') as unknown as string) as ExposureSnapshot;
          },
          set(value: ExposureSnapshot) {
            this.setDataValue('exposureSnapshot', JSON.stringify(value) as unknown as ExposureSnapshot);
          },
        },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'plantings' },
    );
  }

  toPublic() {
    return { id: this.id, batchId: this.batchId, plantedOn: this.plantedOn, count: this.graftCount, location: this.location, notes: this.notes, snapshot: this.exposureSnapshot };
  }
}
