import type { Pool } from 'mariadb';
import type { Series } from '../exposure/windowSolver';
import { sqlInstant } from './readingStore';

/**
 * One logger's readings over [from, to] plus the nearest reading on each side, so a window clipped at `from` or `to`
 * interpolates exactly there. One range scan on the (logger_id, t) key, already in time order; the rows arrive as
 * arrays and land in two Float64Arrays (a 150-day season at 5 minutes is 43,200 readings, under 1 MB).
 */
export async function loadSeries(pool: Pool, loggerId: number, from: number, to: number): Promise<Series> {
  const rows = (await pool.query(
    {
      sql: `SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED), c FROM readings
             WHERE logger_id = ?
               AND t >= COALESCE((SELECT MAX(t) FROM readings WHERE logger_id = ? AND t < ?), ?)
               AND t <= COALESCE((SELECT MIN(t) FROM readings WHERE logger_id = ? AND t > ?), ?)
             ORDER BY t`,
      rowsAsArray: true,
    },
    [loggerId, loggerId, sqlInstant(from), sqlInstant(from), loggerId, sqlInstant(to), sqlInstant(to)],
  )) as [number, number][];
  const t = new Float64Array(rows.length);
  const c = new Float64Array(rows.length);
  for (let i = 0; i < rows.length; i++) {
    t[i] = rows[i][0];
    c[i] = rows[i][1];
  }
  return { t, c };
}

/** The newest reading a logger took in [from, to], epoch ms, or null. */
export async function newestReadingAt(pool: Pool, loggerId: number, from: number, to: number): Promise<number | null> {
  const [row] = (await pool.query(
    { sql: 'SELECT CAST(UNIX_TIMESTAMP(MAX(t)) * 1000 AS SIGNED) FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?', rowsAsArray: true },
    [loggerId, sqlInstant(from), sqlInstant(to)],
  )) as [number | null][];
  return row[0];
}
