import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A count of a batch's grafts found growing on one day after planting out; the latest one gives the take. */
export class TakeAssessment extends Model<InferAttributes<TakeAssessment>, InferCreationAttributes<TakeAssessment>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare batchId: number;
  /** YYYY-MM-DD on the nursery's calendar. */
  declare assessedOn: string;
  declare grown: number;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    TakeAssessment.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        batchId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        assessedOn: { type: DataTypes.DATEONLY, allowNull: false },
        grown: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'take_assessments' },
    );
  }

  toPublic() {
    return { id: this.id, batchId: this.batchId, assessedOn: this.assessedOn, grown: this.grown, notes: this.notes };
  }
}
