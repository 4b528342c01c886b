import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string, onDelete: 'CASCADE' | 'RESTRICT' | 'SET NULL' = 'CASCADE', allowNull = false) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
const timestamps = { created_at: instant(), updated_at: instant() };

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('nurseries', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('users', {
    id,
    nursery_id: ref('nurseries'),
    email: { type: DataTypes.STRING(190), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'staff', 'viewer'), allowNull: false },
    unit: { type: DataTypes.ENUM('C', 'F'), allowNull: false, defaultValue: 'C' },
    // Bumped on password change so every older session cookie stops working.
    session_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    ...timestamps,
  });
  await qi.createTable('invitations', {
    id,
    nursery_id: ref('nurseries'),
    email: { type: DataTypes.STRING(190), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'staff', 'viewer'), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invited_by: ref('users', 'SET NULL', true),
    expires_at: instant(),
    accepted_at: instant(true),
    ...timestamps,
  });
  await qi.createTable('rooms', {
    id,
    nursery_id: ref('nurseries'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('rooms', ['nursery_id', 'name'], { unique: true, name: 'rooms_nursery_name' });
  await qi.createTable('loggers', {
    id,
    nursery_id: ref('nurseries'),
    label: { type: DataTypes.STRING(60), allowNull: false },
    serial: { type: DataTypes.STRING(80), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('loggers', ['nursery_id', 'label'], { unique: true, name: 'loggers_nursery_label' });
  await qi.createTable('logger_placements', {
    id,
    logger_id: ref('loggers'),
    room_id: ref('rooms', 'RESTRICT'),
    placed_from: instant(),
    placed_to: instant(true),
    ...timestamps,
  });
  await qi.addIndex('logger_placements', ['logger_id', 'placed_from'], { name: 'logger_placements_logger_from' });
  await qi.addIndex('logger_placements', ['room_id', 'placed_from'], { name: 'logger_placements_room_from' });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['logger_placements', 'loggers', 'rooms', 'invitations', 'users', 'nurseries']) {
    await qi.dropTable(table);
  }
}
