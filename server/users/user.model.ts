import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role, TemperatureUnit } from '../../shared/schemas/common';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare nurseryId: number;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare role: Role;
  declare unit: CreationOptional<TemperatureUnit>;
  declare sessionVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        nurseryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        email: { type: DataTypes.STRING(190), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false },
        role: { type: DataTypes.ENUM('owner', 'staff', 'viewer'), allowNull: false },
        unit: { type: DataTypes.ENUM('C', 'F'), allowNull: false, defaultValue: 'C' },
        sessionVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'users' },
    );
  }

  /** What the API may show of a user: never the hash or the session version. */
  toPublic() {
    return { id: this.id, email: this.email, name: this.name, role: this.role, unit: this.unit };
  }
}
