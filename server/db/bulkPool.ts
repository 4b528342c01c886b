import mariadb, { type Pool } from 'mariadb';

/**
 * A small connector pool beside Sequelize for the bulk paths (importing and reading readings), where the
 * connector's batch() and streaming are several times faster than going through models. Sessions run in UTC,
 * so UNIX_TIMESTAMP() and DATETIME columns agree.
 */
export function createBulkPool(databaseUrl: string): Pool {
  const u = new URL(databaseUrl);
  const pool = mariadb.createPool({
    host: u.hostname,
    port: Number(u.port || 3306),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.replace(/^\//, ''),
    connectionLimit: 8,
    initSql: "SET time_zone = '+00:00'",
    bigIntAsNumber: true,
    decimalAsNumber: true,
    permitLocalInfile: true,
  });
  // A connection that breaks while idle (server restart, a protocol error after a bulk load) must be logged and
  // dropped by the pool, not end the process as an unhandled 'error' event.
  pool.on('connection', (conn) => {
    conn.on('error', (err) => console.error(`database connection dropped: ${err.message}`));
  });
  return pool;
}
