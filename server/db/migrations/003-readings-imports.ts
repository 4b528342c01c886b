import { DataTypes, type QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('imports', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    nursery_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'nurseries', key: 'id' }, onDelete: 'CASCADE' },
    logger_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'loggers', key: 'id' }, onDelete: 'SET NULL' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    token_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'api_tokens', key: 'id' }, onDelete: 'SET NULL' },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    file_sha256: { type: DataTypes.CHAR(64), allowNull: false },
    file_bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
    status: { type: DataTypes.ENUM('running', 'completed', 'failed'), allowNull: false },
    error_code: { type: DataTypes.STRING(40), allowNull: true },
    error_message: { type: DataTypes.TEXT, allowNull: true },
    rows_total: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    rows_accepted: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    rows_rejected: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    rows_duplicates: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    rows_conflicts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    // Of the accepted rows, how many were new to the database (the rest were already stored with the same value).
    rows_stored: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    first_at: { type: DataTypes.DATE(3), allowNull: true },
    last_at: { type: DataTypes.DATE(3), allowNull: true },
    detection: { type: DataTypes.JSON, allowNull: true },
    rejected_lines: { type: DataTypes.JSON, allowNull: true },
    conflict_lines: { type: DataTypes.JSON, allowNull: true },
    started_at: { type: DataTypes.DATE(3), allowNull: false },
    finished_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('imports', ['nursery_id', 'file_sha256'], { name: 'imports_nursery_hash' });
  await qi.addIndex('imports', ['nursery_id', 'started_at'], { name: 'imports_nursery_started' });
  // Readings are clustered by (logger, time): one logger's range is one contiguous read, and the key makes a
  // reading unique, so no import can store it twice. Narrow types keep a season of readings small.
  await qi.sequelize.query(`
    CREATE TABLE readings (
      logger_id INT UNSIGNED NOT NULL,
      t DATETIME(3) NOT NULL,
      c DECIMAL(7,4) NOT NULL,
      rh DECIMAL(5,2) NULL,
      import_id INT UNSIGNED NOT NULL,
      PRIMARY KEY (logger_id, t),
      CONSTRAINT readings_logger FOREIGN KEY (logger_id) REFERENCES loggers (id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('readings');
  await qi.dropTable('imports');
}
