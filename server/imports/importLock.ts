import type { PoolConnection } from 'mariadb';
import { ApiError } from '../http/errors';

/**
 * Serialises imports per logger across every app instance on the database: the compare-then-insert of one import
 * must not interleave with another's, or a conflicting value could slip in unreported. Answers the release.
 */
export async function lockLogger(conn: PoolConnection, loggerId: number): Promise<() => Promise<void>> {
  const name = `coldknit:import:logger:${loggerId}`;
  const [row] = (await conn.query('SELECT GET_LOCK(?, 120) AS got', [name])) as { got: number | null }[];
  if (row.got !== 1) throw new ApiError(503, 'import_busy', 'Another import for this logger is still running; try again in a minute.');
  return async () => {
    await conn.query('SELECT RELEASE_LOCK(?)', [name]);
  };
}
