// The batch_exposure_cache table: computed figures per batch, valid while the stamp of their inputs is unchanged.
import { createHash } from 'node:crypto';
import type { Pool } from 'mariadb';
import { sqlInstant } from '../readings/readingStore';
import type { BatchFigures } from './batchFigures';
import type { BatchRecord, ExposureInputs } from './exposureInputs';

/** Bump when the computation or the stored shape changes, so rows written by older code are recomputed. */
const CACHE_FORMAT = 1;

/** The parts of a stamp shared by many batches, worked out once per read: per room its logger stays, per profile its numbers. */
export function stampParts(inputs: ExposureInputs) {
  const rooms = new Map<number, string>();
  for (const [roomId, stays] of inputs.staysByRoom) {
    rooms.set(roomId, JSON.stringify(stays.map((s) => [s.loggerId, s.from, s.to, inputs.generations.get(s.loggerId) ?? 0])));
  }
  const profiles = new Map<string, string>();
  for (const [key, p] of inputs.profiles) profiles.set(key, JSON.stringify([p.freezeC, p.band, p.callus]));
  return { rooms, profiles };
}

export type StampParts = ReturnType<typeof stampParts>;

/**
 * Digest of every input but the readings themselves: the profile's numbers, the batch's placements, and for each
 * of its rooms the loggers' stays there with each logger's latest completed import id. A new import (the importer's,
 * the demo top-up's) raises that id, so the importer needs to call nothing: the next read finds the stamp changed.
 */
export function stampOf(batch: BatchRecord, parts: StampParts): string {
  const hash = createHash('sha1').update(`${CACHE_FORMAT}|${batch.speciesKey}|${parts.profiles.get(batch.speciesKey) ?? ''}`);
  for (const p of batch.placements) hash.update(`|${p.id},${p.roomId},${p.from},${p.to}`);
  for (const roomId of new Set(batch.placements.map((p) => p.roomId))) hash.update(`|${roomId}:${parts.rooms.get(roomId) ?? '[]'}`);
  return hash.digest('hex');
}

export interface CachedFigures {
  stamp: string;
  /** Epoch ms after which the row must be recomputed; null for never. */
  validUntil: number | null;
  figures: BatchFigures;
}

export type CacheView = 'summary' | 'detail';

/**
 * Cached rows of the nursery (or of one batch): `summary` for the nursery table, `detail` for a batch page. The
 * nursery table stores summaries only (its detail column stays empty until that batch's page is opened), so a row
 * without the view asked for is no row at all.
 */
export async function readCache(pool: Pool, nurseryId: number, view: CacheView, batchId?: number): Promise<Map<number, CachedFigures>> {
  const column = view === 'summary' ? 'summary' : 'detail';
  const rows = (await pool.query(
    {
      sql: `SELECT batch_id, stamp, CAST(UNIX_TIMESTAMP(valid_until) * 1000 AS SIGNED), ${column}
              FROM batch_exposure_cache WHERE nursery_id = ?${batchId === undefined ? '' : ' AND batch_id = ?'} AND ${column} <> ''`,
      rowsAsArray: true,
    },
    batchId === undefined ? [nurseryId] : [nurseryId, batchId],
  )) as [number, string, number | null, string][];
  return new Map(rows.map(([id, stamp, validUntil, json]) => [id, { stamp, validUntil, figures: JSON.parse(json) as BatchFigures }]));
}

/** Whether a cached row still answers for the batch at `now`. */
export const isFresh = (cached: CachedFigures | undefined, stamp: string, now: number): cached is CachedFigures =>
  cached !== undefined && cached.stamp === stamp && (cached.validUntil === null || now < cached.validUntil);

export interface CacheEntry {
  batchId: number;
  stamp: string;
  validUntil: number | null;
  figures: BatchFigures;
}

/** The table view keeps the headline only; the detail keeps every placement and logger. */
const summaryOf = (figures: BatchFigures): BatchFigures => ({ ...figures, placements: [] });

/** Rows per INSERT: a few hundred kB of JSON per statement, well under max_allowed_packet. */
const WRITE_CHUNK = 100;

/**
 * Stores the summary always and the detail only for the detail view: every batch's detail would add megabytes to
 * the nursery table's cold computation for pages nobody may open. Multi-row INSERTs through the text protocol rather
 * than batch(): the connector's bulk path (3.0.2) has been seen to garble long string values that straddle its
 * packet boundaries ("Incorrect string value" from the server).
 */
export async function writeCache(pool: Pool, nurseryId: number, entries: CacheEntry[], view: CacheView): Promise<void> {
  for (let start = 0; start < entries.length; start += WRITE_CHUNK) {
    const chunk = entries.slice(start, start + WRITE_CHUNK);
    await pool.query(
      `INSERT INTO batch_exposure_cache (batch_id, nursery_id, stamp, computed_at, valid_until, summary, detail)
       VALUES ${chunk.map(() => '(?, ?, ?, ?, ?, ?, ?)').join(', ')}
       ON DUPLICATE KEY UPDATE stamp = VALUES(stamp), computed_at = VALUES(computed_at), valid_until = VALUES(valid_until),
                               summary = VALUES(summary), detail = VALUES(detail)`,
      chunk.flatMap((e) => [
        e.batchId,
        nurseryId,
        e.stamp,
        sqlInstant(e.figures.computedAt),
        e.validUntil === null ? null : sqlInstant(e.validUntil),
        JSON.stringify(summaryOf(e.figures)),
        view === 'detail' ? JSON.stringify(e.figures) : '',
      ]),
    );
  }
}
