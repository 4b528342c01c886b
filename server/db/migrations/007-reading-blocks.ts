import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  // Derived from readings, for charts of long ranges: per logger, quantity and block size, the first, lowest,
  // highest and last reading of each block with their instants (epoch ms, so rows are read without date parsing).
  // Rebuilt from readings whenever an import touches a block; safe to empty at any time.
  await qi.sequelize.query(`
    CREATE TABLE reading_blocks (
      logger_id INT UNSIGNED NOT NULL,
      quantity ENUM('c', 'rh') NOT NULL,
      block_minutes SMALLINT UNSIGNED NOT NULL,
      start_ms BIGINT NOT NULL,
      first_ms BIGINT NOT NULL,
      first_v DECIMAL(7,4) NOT NULL,
      min_ms BIGINT NOT NULL,
      min_v DECIMAL(7,4) NOT NULL,
      max_ms BIGINT NOT NULL,
      max_v DECIMAL(7,4) NOT NULL,
      last_ms BIGINT NOT NULL,
      last_v DECIMAL(7,4) NOT NULL,
      PRIMARY KEY (logger_id, quantity, block_minutes, start_ms),
      CONSTRAINT reading_blocks_logger FOREIGN KEY (logger_id) REFERENCES loggers (id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
  // Per logger, the imports whose readings the blocks already include (every import up to this id).
  await qi.sequelize.query(`
    CREATE TABLE reading_block_marks (
      logger_id INT UNSIGNED NOT NULL PRIMARY KEY,
      through_import_id INT UNSIGNED NOT NULL,
      CONSTRAINT reading_block_marks_logger FOREIGN KEY (logger_id) REFERENCES loggers (id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('reading_block_marks');
  await qi.dropTable('reading_blocks');
}
