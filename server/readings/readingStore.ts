import type { PoolConnection } from 'mariadb';
import type { LineNote, Reading } from '../../shared/import/types';

/** Stored to 0.0001 °C (DECIMAL(7,4)); a file value is "the same" as a stored one when equal at that precision. */
export const storedC = (c: number) => Math.round(c * 10_000) / 10_000;
const storedRh = (rh: number | null) => (rh === null ? null : (Math.round(rh * 100) / 100).toFixed(2));

/** 'YYYY-MM-DD HH:MM:SS.mmm' in UTC: batch() takes strings at full speed where Date objects fall back to row-by-row. */
export const sqlInstant = (t: number) => new Date(t).toISOString().slice(0, 23).replace('T', ' ');

export interface BatchOutcome {
  stored: number;
  alreadyStored: number;
  conflicts: LineNote[];
}

/**
 * Compares one batch of a file with what is stored for the logger and inserts only the new readings.
 * A stored reading with another value is a conflict: reported, never overwritten. The caller holds the logger's
 * import lock, so no other import can slip a reading in between the SELECT and the INSERT.
 */
export async function storeBatch(conn: PoolConnection, loggerId: number, importId: number | null, batch: Reading[]): Promise<BatchOutcome> {
  let lo = Infinity;
  let hi = -Infinity;
  for (const r of batch) {
    if (r.t < lo) lo = r.t;
    if (r.t > hi) hi = r.t;
  }
  const existing = new Map<number, number>();
  const rows = await conn.query(
    { sql: 'SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED) AS ms, c FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?', rowsAsArray: true },
    [loggerId, sqlInstant(lo), sqlInstant(hi)],
  ) as [number, number][];
  for (const [ms, c] of rows) existing.set(ms, c);

  const fresh: (string | number | null)[][] = [];
  const conflicts: LineNote[] = [];
  let alreadyStored = 0;
  for (const r of batch) {
    const c = storedC(r.c);
    const stored = existing.get(r.t);
    if (stored === undefined) fresh.push([loggerId, sqlInstant(r.t), c.toFixed(4), storedRh(r.rh), importId]);
    else if (stored === c) alreadyStored++;
    else conflicts.push({ line: r.line, reason: `already stored with ${stored} °C at this time; the file says ${c} °C (kept the stored value)` });
  }
  // Without an import record (a dry run) the comparison is all that is wanted.
  if (fresh.length && importId !== null) await conn.batch('INSERT INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, ?, ?)', fresh);
  return { stored: fresh.length, alreadyStored, conflicts };
}
