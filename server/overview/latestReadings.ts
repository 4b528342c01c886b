import type { Pool } from 'mariadb';
import { loggingIntervalMs } from '../../shared/series/freshness';
import { sqlInstant } from '../readings/readingStore';

/** Enough recent readings for a median step that one missed reading does not move. */
const RECENT = 11;

export interface LatestReading {
  latest: { t: number; c: number; rh: number | null } | null;
  intervalMs: number | null;
}

/** A logger's newest reading since `since` (when it came into the room) and its usual spacing: one short read of the key. */
export async function latestReading(pool: Pool, loggerId: number, since: number): Promise<LatestReading> {
  const rows = (await pool.query(
    { sql: 'SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED), c, rh FROM readings WHERE logger_id = ? AND t >= ? ORDER BY t DESC LIMIT ?', rowsAsArray: true },
    [loggerId, sqlInstant(since), RECENT],
  )) as [number, number, number | null][];
  if (rows.length === 0) return { latest: null, intervalMs: null };
  const [t, c, rh] = rows[0];
  return { latest: { t, c, rh }, intervalMs: loggingIntervalMs(rows.map((r) => r[0])) };
}
