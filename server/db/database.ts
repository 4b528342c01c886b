import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import { createBulkPool } from './bulkPool';
import { initModels } from './models';
import { createSequelize } from './sequelize';

export interface Database {
  sequelize: Sequelize;
  pool: Pool;
  close(): Promise<void>;
}

/** Sequelize for records, a connector pool for readings; both on the same MariaDB. */
export function openDatabase(databaseUrl: string): Database {
  const sequelize = createSequelize(databaseUrl);
  initModels(sequelize);
  const pool = createBulkPool(databaseUrl);
  return {
    sequelize,
    pool,
    async close() {
      await Promise.all([sequelize.close(), pool.end()]);
    },
  };
}
