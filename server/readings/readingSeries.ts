import type { Pool } from 'mariadb';
import type { Series } from '../exposure/windowSolver';
import { sqlInstant } from './readingStore';

/** Room for a week of 5-minute readings; the arrays double as they fill. */
const INITIAL_CAPACITY = 2048;

/**
 * One logger's readings over [from, to] plus the nearest reading on each side, so a window clipped at `from` or `to`
 * interpolates exactly there. One range scan on the (logger_id, t) key, already in time order. Rows are streamed
 * straight into two Float64Arrays (a 150-day season at 5 minutes is 43,200 readings, under 1 MB) rather than
 * buffered as row objects first, which keeps a long range cheap for the garbage collector.
 */
export async function loadSeries(pool: Pool, loggerId: number, from: number, to: number): Promise<Series> {
  let t = new Float64Array(INITIAL_CAPACITY);
  let c = new Float64Array(INITIAL_CAPACITY);
  let n = 0;
  const conn = await pool.getConnection();
  try {
    const rows = conn.queryStream(
      {
        sql: `SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED), c FROM readings
               WHERE logger_id = ?
                 AND t >= COALESCE((SELECT MAX(t) FROM readings WHERE logger_id = ? AND t < ?), ?)
                 AND t <= COALESCE((SELECT MIN(t) FROM readings WHERE logger_id = ? AND t > ?), ?)
               ORDER BY t`,
        rowsAsArray: true,
      },
      [loggerId, loggerId, sqlInstant(from), sqlInstant(from), loggerId, sqlInstant(to), sqlInstant(to)],
    );
    for await (const [ms, celsius] of rows as AsyncIterable<[number, number]>) {
      if (n === t.length) {
        const grownT = new Float64Array(n * 2);
        const grownC = new Float64Array(n * 2);
        grownT.set(t);
        grownC.set(c);
        t = grownT;
        c = grownC;
      }
      t[n] = ms;
      c[n] = celsius;
      n++;
    }
  } finally {
    conn.release();
  }
  return { t: t.subarray(0, n), c: c.subarray(0, n) };
}

/** The newest reading a logger took in [from, to], epoch ms, or null. */
export async function newestReadingAt(pool: Pool, loggerId: number, from: number, to: number): Promise<number | null> {
  const [row] = (await pool.query(
    { sql: 'SELECT CAST(UNIX_TIMESTAMP(MAX(t)) * 1000 AS SIGNED) FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?', rowsAsArray: true },
    [loggerId, sqlInstant(from), sqlInstant(to)],
  )) as [number | null][];
  return row[0];
}
