import type { Pool } from 'mariadb';

/**
 * Runs `work` while holding a MariaDB named lock (GET_LOCK), so that only one app instance on the database does
 * it at a time. The lock belongs to one connection, which is held for the duration and released after; if the
 * process dies the server drops the connection and the lock with it. Answers false, without running `work`,
 * when another session keeps the lock longer than `waitSeconds` (0: do not wait).
 */
export async function withNamedLock(pool: Pool, name: string, waitSeconds: number, work: () => Promise<void>): Promise<boolean> {
  const conn = await pool.getConnection();
  try {
    const [row] = (await conn.query('SELECT GET_LOCK(?, ?) AS got', [name, waitSeconds])) as { got: number | null }[];
    if (row.got !== 1) return false;
    try {
      await work();
    } finally {
      await conn.query('SELECT RELEASE_LOCK(?)', [name]);
    }
    return true;
  } finally {
    conn.release();
  }
}
