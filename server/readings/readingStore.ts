import type { PoolConnection } from 'mariadb';
import type { LineNote } from '../../shared/import/types';
import { C, LINE, STRIDE, T, countOf, pickReadings, type PackedReadings } from '../imports/packedReadings';
import { writeInstant } from './loadDataText';

/** Stored to 0.0001 °C (DECIMAL(7,4)); a file value is "the same" as a stored one when equal at that precision. */
export const storedC = (c: number) => Math.round(c * 10_000) / 10_000;

const instantBytes = Buffer.alloc(23);

/** 'YYYY-MM-DD HH:MM:SS.mmm' in UTC, as query parameters: the connector takes strings at full speed, Date objects row by row. */
export function sqlInstant(t: number): string {
  writeInstant(instantBytes, 0, t);
  return instantBytes.toString('ascii');
}

/** The first and last stored instant of a logger, or null when it has none. */
export async function storedSpan(conn: PoolConnection, loggerId: number): Promise<{ first: number; last: number } | null> {
  const [row] = (await conn.query(
    'SELECT CAST(UNIX_TIMESTAMP(MIN(t)) * 1000 AS SIGNED) AS first, CAST(UNIX_TIMESTAMP(MAX(t)) * 1000 AS SIGNED) AS last FROM readings WHERE logger_id = ?',
    [loggerId],
  )) as { first: number | null; last: number | null }[];
  return row.first === null || row.last === null ? null : { first: row.first, last: row.last };
}

export interface Comparison {
  /** Readings not stored yet for this logger. */
  fresh: PackedReadings;
  alreadyStored: number;
  conflicts: LineNote[];
}

/**
 * Compares one batch of a file with what is stored for the logger. A stored reading with another value is a
 * conflict: reported, never overwritten. The caller holds the logger's import lock, so nothing can be stored
 * between this SELECT (or the `stored` span it read under the lock) and the caller's insert.
 */
export async function compareWithStored(
  conn: PoolConnection,
  loggerId: number,
  batch: PackedReadings,
  stored: { first: number; last: number } | null,
): Promise<Comparison> {
  let lo = Infinity;
  let hi = -Infinity;
  for (let r = 0; r < batch.length; r += STRIDE) {
    if (batch[r + T] < lo) lo = batch[r + T];
    if (batch[r + T] > hi) hi = batch[r + T];
  }
  // A batch wholly outside what is stored (a new logger, the new days of a re-export) needs no look-up.
  if (stored === null || hi < stored.first || lo > stored.last) return { fresh: batch, alreadyStored: 0, conflicts: [] };
  const rows = (await conn.query(
    { sql: 'SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED) AS ms, c FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?', rowsAsArray: true },
    [loggerId, sqlInstant(lo), sqlInstant(hi)],
  )) as [number, number][];
  if (rows.length === 0) return { fresh: batch, alreadyStored: 0, conflicts: [] };
  const existing = new Map<number, number>(rows);
  const fresh: number[] = [];
  const conflicts: LineNote[] = [];
  let alreadyStored = 0;
  for (let i = 0; i < countOf(batch); i++) {
    const at = i * STRIDE;
    const kept = existing.get(batch[at + T]);
    const c = storedC(batch[at + C]);
    if (kept === undefined) fresh.push(i);
    else if (kept === c) alreadyStored++;
    else conflicts.push({ line: batch[at + LINE], reason: `already stored with ${kept} °C at this time; the file says ${c} °C (kept the stored value)` });
  }
  return { fresh: pickReadings(batch, fresh), alreadyStored, conflicts };
}
