import type { Pool } from 'mariadb';
import { sqlInstant } from '../readings/readingStore';

/** A half-open stretch [from, to) in epoch ms. */
export interface HalfOpen {
  from: number;
  to: number;
}

/** [epoch ms, °C, % RH or null], as the connector hands rows over with rowsAsArray. */
export type RawRow = [number, number, number | null];

/** The SELECT of one logger's readings inside any of the ranges, in time order, with its parameters. */
export function rangeQuery(loggerId: number, ranges: readonly HalfOpen[]) {
  const wanted = ranges.filter((r) => r.to > r.from);
  return {
    sql: `SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED), c, rh FROM readings
           WHERE logger_id = ? AND (${wanted.map(() => '(t >= ? AND t < ?)').join(' OR ') || 'FALSE'}) ORDER BY t`,
    values: [loggerId, ...wanted.flatMap((r) => [sqlInstant(r.from), sqlInstant(r.to)])],
  };
}

/** One logger's readings inside any of the ranges, in time order: one query on the (logger_id, t) key. */
export async function readRaw(pool: Pool, loggerId: number, ranges: readonly HalfOpen[]): Promise<RawRow[]> {
  if (!ranges.some((r) => r.to > r.from)) return [];
  const { sql, values } = rangeQuery(loggerId, ranges);
  return (await pool.query({ sql, rowsAsArray: true }, values)) as RawRow[];
}
