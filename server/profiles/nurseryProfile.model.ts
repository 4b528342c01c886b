import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SpeciesProfile } from '../../shared/species/schema';

/** A nursery's own species profile: a copy of a built-in one (or of another copy), edited by the owner. */
export class NurseryProfile extends Model<InferAttributes<NurseryProfile>, InferCreationAttributes<NurseryProfile>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare key: string;
  declare name: string;
  /** The built-in profile this one descends from, even when copied from another copy. */
  declare basedOn: string;
  declare freezeC: number;
  declare bandMinC: number;
  declare bandMaxC: number;
  declare storageMaxC: number | null;
  declare callusBaseC: number;
  declare callusOptLowC: number;
  declare callusOptHighC: number;
  declare callusUpperC: number;
  declare callusHoursAtOptimum: number;
  declare sources: SpeciesProfile['sources'];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const celsius = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });
    NurseryProfile.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        key: { type: DataTypes.STRING(40), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        basedOn: { type: DataTypes.STRING(40), allowNull: false },
        freezeC: celsius(),
        bandMinC: celsius(),
        bandMaxC: celsius(),
        storageMaxC: celsius(true),
        callusBaseC: celsius(),
        callusOptLowC: celsius(),
        callusOptHighC: celsius(),
        callusUpperC: celsius(),
        callusHoursAtOptimum: celsius(),
        sources: {
          type: DataTypes.TEXT('long'),
          allowNull: false,
          get(this: NurseryProfile) {
            return JSON.parse(this.getDataValue('sources') as unknown as string);
          },
          set(this: NurseryProfile, value: SpeciesProfile['sources']) {
            this.setDataValue('sources', JSON.stringify(value) as never);
          },
        },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'species_profiles' },
    );
  }

  toProfile(): SpeciesProfile {
    return {
      key: this.key,
      name: this.name,
      freezeC: this.freezeC,
      band: { minC: this.bandMinC, maxC: this.bandMaxC },
      storageMaxC: this.storageMaxC,
      callus: {
        baseC: this.callusBaseC,
        optLowC: this.callusOptLowC,
        optHighC: this.callusOptHighC,
        upperC: this.callusUpperC,
        hoursAtOptimum: this.callusHoursAtOptimum,
      },
      sources: this.sources,
    };
  }

  /** The column values for a profile; the inverse of toProfile. */
  static columnsOf(profile: SpeciesProfile) {
    return {
      key: profile.key,
      name: profile.name,
      freezeC: profile.freezeC,
      bandMinC: profile.band.minC,
      bandMaxC: profile.band.maxC,
      storageMaxC: profile.storageMaxC,
      callusBaseC: profile.callus.baseC,
      callusOptLowC: profile.callus.optLowC,
      callusOptHighC: profile.callus.optHighC,
      callusUpperC: profile.callus.upperC,
      callusHoursAtOptimum: profile.callus.hoursAtOptimum,
      sources: profile.sources,
    };
  }
}
