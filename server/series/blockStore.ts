import type { Pool } from 'mariadb';
import type { BlockSummary } from '../../shared/series/blocks';
import type { BlockMinutes } from '../../shared/series/bucketGrid';
import type { HalfOpen } from './rawReadings';

export type Quantity = 'c' | 'rh';

type BlockRow = [Quantity, number, number, number, number, number, number, number, number, number];

/** Stored blocks of one size whose start lies in [from, to), per quantity, in time order. */
export async function readBlocks(pool: Pool, loggerId: number, minutes: BlockMinutes, starts: HalfOpen): Promise<Record<Quantity, BlockSummary[]>> {
  const rows = (await pool.query(
    {
      sql: `SELECT quantity, start_ms, first_ms, first_v, min_ms, min_v, max_ms, max_v, last_ms, last_v FROM reading_blocks
             WHERE logger_id = ? AND quantity IN ('c', 'rh') AND block_minutes = ? AND start_ms >= ? AND start_ms < ?
             ORDER BY quantity, start_ms`,
      rowsAsArray: true,
    },
    [loggerId, minutes, starts.from, starts.to],
  )) as BlockRow[];
  const out: Record<Quantity, BlockSummary[]> = { c: [], rh: [] };
  for (const [quantity, start, ft, fv, mt, mv, xt, xv, lt, lv] of rows) {
    out[quantity].push({ start, first: { t: ft, v: fv }, min: { t: mt, v: mv }, max: { t: xt, v: xv }, last: { t: lt, v: lv } });
  }
  return out;
}
