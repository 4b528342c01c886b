import type { PoolConnection } from 'mariadb';
import type { LineNote, Reading } from '../../shared/import/types';

/** Stored to 0.0001 °C (DECIMAL(7,4)); a file value is "the same" as a stored one when equal at that precision. */
export const storedC = (c: number) => Math.round(c * 10_000) / 10_000;

/** 'YYYY-MM-DD HH:MM:SS.mmm' in UTC: the connector and LOAD DATA take strings at full speed, Date objects row by row. */
export const sqlInstant = (t: number) => new Date(t).toISOString().slice(0, 23).replace('T', ' ');

export interface Comparison {
  /** Readings not stored yet for this logger. */
  fresh: Reading[];
  alreadyStored: number;
  conflicts: LineNote[];
}

/**
 * Compares one batch of a file with what is stored for the logger. A stored reading with another value is a
 * conflict: reported, never overwritten. The caller holds the logger's import lock, so nothing can be stored
 * between this SELECT and the caller's insert.
 */
export async function compareWithStored(conn: PoolConnection, loggerId: number, batch: Reading[]): Promise<Comparison> {
  let lo = Infinity;
  let hi = -Infinity;
  for (const r of batch) {
    if (r.t < lo) lo = r.t;
    if (r.t > hi) hi = r.t;
  }
  const rows = (await conn.query(
    { sql: 'SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED) AS ms, c FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?', rowsAsArray: true },
    [loggerId, sqlInstant(lo), sqlInstant(hi)],
  )) as [number, number][];
  if (rows.length === 0) return { fresh: batch, alreadyStored: 0, conflicts: [] };
  const existing = new Map<number, number>(rows);
  const fresh: Reading[] = [];
  const conflicts: LineNote[] = [];
  let alreadyStored = 0;
  for (const r of batch) {
    const stored = existing.get(r.t);
    const c = storedC(r.c);
    if (stored === undefined) fresh.push(r);
    else if (stored === c) alreadyStored++;
    else conflicts.push({ line: r.line, reason: `already stored with ${stored} °C at this time; the file says ${c} °C (kept the stored value)` });
  }
  return { fresh, alreadyStored, conflicts };
}

/** One tab-separated line per reading, in the column order of `LOAD_READINGS`; \N is LOAD DATA's NULL. */
export function readingLines(loggerId: number, importId: number, readings: Reading[]): string {
  let out = '';
  for (const r of readings) {
    const rh = r.rh === null ? '\\N' : (Math.round(r.rh * 100) / 100).toFixed(2);
    out += `${loggerId}\t${sqlInstant(r.t)}\t${storedC(r.c).toFixed(4)}\t${rh}\t${importId}\n`;
  }
  return out;
}

export const LOAD_READINGS = "LOAD DATA LOCAL INFILE ? INTO TABLE readings CHARACTER SET ascii FIELDS TERMINATED BY '\\t' (logger_id, t, c, rh, import_id)";
