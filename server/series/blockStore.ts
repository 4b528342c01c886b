import type { Pool, PoolConnection } from 'mariadb';
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

export interface BlockSet {
  quantity: Quantity;
  minutes: BlockMinutes;
  blocks: BlockSummary[];
}

const v4 = (v: number) => v.toFixed(4);

/** Replaces every stored block starting in [from, to) with the given sets, inside the caller's transaction. */
export async function replaceBlocks(conn: PoolConnection, loggerId: number, starts: HalfOpen, sets: readonly BlockSet[]): Promise<void> {
  await conn.query('DELETE FROM reading_blocks WHERE logger_id = ? AND start_ms >= ? AND start_ms < ?', [loggerId, starts.from, starts.to]);
  // Strings throughout: the connector's batch() falls back to row-by-row inserts for mixed numeric types.
  const rows = sets.flatMap(({ quantity, minutes, blocks }) =>
    blocks.map((b) => [
      String(loggerId), quantity, String(minutes), String(b.start),
      String(b.first.t), v4(b.first.v), String(b.min.t), v4(b.min.v), String(b.max.t), v4(b.max.v), String(b.last.t), v4(b.last.v),
    ]),
  );
  if (rows.length) {
    await conn.batch(
      `INSERT INTO reading_blocks (logger_id, quantity, block_minutes, start_ms, first_ms, first_v, min_ms, min_v, max_ms, max_v, last_ms, last_v)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
      rows,
    );
  }
}
