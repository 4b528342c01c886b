import { DataTypes } from 'sequelize';

/**
 * A JSON value kept in a LONGTEXT column: MariaDB's JSON type is LONGTEXT anyway and hands values back as
 * strings, so the model (de)serialises them itself.
 */
export function jsonText<T>(name: string) {
  return {
    type: DataTypes.TEXT('long'),
    allowNull: false,
    get(this: { getDataValue(key: string): unknown }): T {
      return JSON.parse(this.getDataValue(name) as string) as T;
    },
    set(this: { setDataValue(key: string, value: unknown): void }, value: T) {
      this.setDataValue(name, JSON.stringify(value));
    },
  };
}
