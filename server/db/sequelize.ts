import { Sequelize } from 'sequelize';

/** One Sequelize per process; times are stored and read as UTC whatever the server's zone. */
export function createSequelize(databaseUrl: string): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: 'mariadb',
    logging: false,
    timezone: '+00:00',
    dialectOptions: { timezone: 'Etc/UTC', permitLocalInfile: true, connectTimeout: 10_000 },
    pool: { max: 10, min: 0, idle: 10_000 },
    define: { underscored: true },
  });
}
