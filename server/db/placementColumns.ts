import { DataTypes, type ModelAttributes } from 'sequelize';

/**
 * The columns of a stay in a room — a logger's or a batch's: who (`ownerKey`), which room, from when, until when.
 * Both kinds of placement keep the same shape so moves and exposure windows are worked out the same way.
 */
export function placementColumns(ownerKey: string): ModelAttributes {
  return {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    [ownerKey]: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    roomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    placedFrom: { type: DataTypes.DATE(3), allowNull: false },
    placedTo: { type: DataTypes.DATE(3), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  };
}
