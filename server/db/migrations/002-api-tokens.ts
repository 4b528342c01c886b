import { DataTypes, type QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('api_tokens', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    nursery_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'nurseries', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    // Only a SHA-256 of the token is kept; the token itself is shown once when made.
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    hint: { type: DataTypes.STRING(12), allowNull: false },
    created_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    last_used_at: { type: DataTypes.DATE(3), allowNull: true },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('api_tokens');
}
