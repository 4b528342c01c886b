import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Detection, LineNote } from '../../shared/import/types';

export type ImportStatus = 'running' | 'completed' | 'failed';

/** One logger file brought in: who, when, what it held, and what became of every row. */
export class Import extends Model<InferAttributes<Import>, InferCreationAttributes<Import>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare loggerId: number | null;
  declare userId: number | null;
  declare tokenId: number | null;
  declare fileName: string;
  declare fileSha256: string;
  declare fileBytes: number;
  declare status: ImportStatus;
  declare errorCode: CreationOptional<string | null>;
  declare errorMessage: CreationOptional<string | null>;
  declare rowsTotal: CreationOptional<number>;
  declare rowsAccepted: CreationOptional<number>;
  declare rowsRejected: CreationOptional<number>;
  declare rowsDuplicates: CreationOptional<number>;
  declare rowsConflicts: CreationOptional<number>;
  declare rowsStored: CreationOptional<number>;
  declare firstAt: CreationOptional<Date | null>;
  declare lastAt: CreationOptional<Date | null>;
  /** The span of the readings this import stored, null when it stored none (see migration 008). */
  declare storedFirstAt: CreationOptional<Date | null>;
  declare storedLastAt: CreationOptional<Date | null>;
  declare detection: CreationOptional<Detection | null>;
  declare rejectedLines: CreationOptional<LineNote[] | null>;
  declare conflictLines: CreationOptional<LineNote[] | null>;
  declare startedAt: Date;
  declare finishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const json = (name: string) => ({
      type: DataTypes.JSON,
      allowNull: true,
      // MariaDB keeps JSON as LONGTEXT and hands it back as a string.
      get(this: Import) {
        const raw = this.getDataValue(name as never) as unknown;
        return typeof raw === 'string' ? JSON.parse(raw) : raw;
      },
    });
    // A fresh object per attribute: Sequelize writes the column name into the definition it is given.
    const count = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
    Import.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        loggerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        tokenId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        fileSha256: { type: DataTypes.CHAR(64), allowNull: false },
        fileBytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
        status: { type: DataTypes.ENUM('running', 'completed', 'failed'), allowNull: false },
        errorCode: { type: DataTypes.STRING(40), allowNull: true },
        errorMessage: { type: DataTypes.TEXT, allowNull: true },
        rowsTotal: count(),
        rowsAccepted: count(),
        rowsRejected: count(),
        rowsDuplicates: count(),
        rowsConflicts: count(),
        rowsStored: count(),
        firstAt: { type: DataTypes.DATE(3), allowNull: true },
        lastAt: { type: DataTypes.DATE(3), allowNull: true },
        storedFirstAt: { type: DataTypes.DATE(3), allowNull: true },
        storedLastAt: { type: DataTypes.DATE(3), allowNull: true },
        detection: json('detection'),
        rejectedLines: json('rejectedLines'),
        conflictLines: json('conflictLines'),
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        finishedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'imports' },
    );
  }
}
