import type { PoolConnection } from 'mariadb';
import { ApiError } from '../http/errors';

/**
 * Serialises imports per logger across every app instance on the database: the compare-then-insert of one import
 * must not interleave with another's, or a conflicting value could slip in unreported.
 */
export async function withLoggerLock<T>(conn: PoolConnection, loggerId: number, work: () => Promise<T>): Promise<T> {
  const name = `coldknit:import:logger:${loggerId}`;
  const [row] = (await conn.query('SELECT GET_LOCK(?, 120) AS got', [name])) as { got: number | null }[];
  if (row.got !== 1) throw new ApiError(503, 'import_busy', 'Another import for this logger is still running; try again in a minute.');
  try {
    return await work();
  } finally {
    await conn.query('SELECT RELEASE_LOCK(?)', [name]);
  }
}
