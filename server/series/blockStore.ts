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

/** A block as SQL values; every part is a number we computed, or a quantity from the closed set above. */
const blockValues = (loggerId: number, quantity: Quantity, minutes: number, b: BlockSummary) =>
  `(${loggerId},'${quantity}',${minutes},${b.start},${b.first.t},${b.first.v.toFixed(4)},${b.min.t},${b.min.v.toFixed(4)},` +
  `${b.max.t},${b.max.v.toFixed(4)},${b.last.t},${b.last.v.toFixed(4)})`;

/** Rows per INSERT statement: a fortnight of every block size of both quantities fits in about two. */
const ROWS_PER_INSERT = 2000;

/**
 * Replaces every stored block starting in [from, to) with the given sets, inside the caller's transaction. Rows go as
 * multi-row INSERTs of numbers written into the statement: one string per 2,000 blocks, where parameter arrays made
 * twelve small strings per block (a million of them after a first import of a year; measured as tens of MB of
 * garbage on the server's heap).
 */
export async function replaceBlocks(conn: PoolConnection, loggerId: number, starts: HalfOpen, sets: readonly BlockSet[]): Promise<void> {
  await conn.query('DELETE FROM reading_blocks WHERE logger_id = ? AND start_ms >= ? AND start_ms < ?', [loggerId, starts.from, starts.to]);
  const values = sets.flatMap(({ quantity, minutes, blocks }) => blocks.map((b) => blockValues(loggerId, quantity, minutes, b)));
  for (let at = 0; at < values.length; at += ROWS_PER_INSERT) {
    await conn.query(
      `INSERT INTO reading_blocks (logger_id, quantity, block_minutes, start_ms, first_ms, first_v, min_ms, min_v, max_ms, max_v, last_ms, last_v)
       VALUES ${values.slice(at, at + ROWS_PER_INSERT).join(',')}`,
    );
  }
}
