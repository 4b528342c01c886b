// Everything but readings that a batch's exposure depends on, read with plain queries through the connector pool.
import type { Pool } from 'mariadb';
import type { BatchStatus } from '../../shared/schemas/batches';
import type { SpeciesProfile } from '../../shared/species/schema';
import { profilesOf } from '../profiles/profiles.service';
import type { BatchStay } from './batchPlan';
import type { LoggerStay } from './spans';

export interface BatchRecord {
  id: number;
  code: string;
  speciesKey: string;
  scionCultivar: string;
  rootstock: string;
  count: number;
  graftedOn: string;
  status: BatchStatus;
  placements: BatchStay[];
}

export interface ExposureInputs {
  batches: BatchRecord[];
  staysByRoom: Map<number, LoggerStay[]>;
  /** Per logger, the id of its latest completed import: it changes whenever the logger's readings do. */
  generations: Map<number, number>;
  profiles: Map<string, SpeciesProfile>;
}

/** Which batches: one by id (any status) or every batch still in storage. */
export type BatchScope = { batchId: number } | 'in_storage';

const ms = (column: string) => `CAST(UNIX_TIMESTAMP(${column}) * 1000 AS SIGNED)`;

export async function loadExposureInputs(pool: Pool, nurseryId: number, scope: BatchScope): Promise<ExposureInputs> {
  const [scopeSql, scopeArg] = scope === 'in_storage' ? ["b.status = 'in_storage'", null] : ['b.id = ?', scope.batchId];
  const args = scopeArg === null ? [nurseryId] : [nurseryId, scopeArg];
  const [batchRows, placementRows, stayRows, generationRows, profiles] = await Promise.all([
    pool.query(
      {
        sql: `SELECT b.id, b.code, b.species_key, b.scion_cultivar, b.rootstock, b.graft_count, DATE_FORMAT(b.grafted_on, '%Y-%m-%d'), b.status
                FROM batches b WHERE b.nursery_id = ? AND ${scopeSql} ORDER BY b.id`,
        rowsAsArray: true,
      },
      args,
    ) as Promise<[number, string, string, string, string, number, string, BatchStatus][]>,
    pool.query(
      {
        sql: `SELECT p.batch_id, p.id, p.room_id, ${ms('p.placed_from')}, ${ms('p.placed_to')}
                FROM batch_placements p JOIN batches b ON b.id = p.batch_id
               WHERE b.nursery_id = ? AND ${scopeSql} ORDER BY p.batch_id, p.placed_from`,
        rowsAsArray: true,
      },
      args,
    ) as Promise<[number, number, number, number, number | null][]>,
    pool.query(
      {
        sql: `SELECT p.logger_id, p.room_id, ${ms('p.placed_from')}, ${ms('p.placed_to')}
                FROM logger_placements p JOIN loggers l ON l.id = p.logger_id
               WHERE l.nursery_id = ? ORDER BY p.room_id, p.placed_from, p.logger_id`,
        rowsAsArray: true,
      },
      [nurseryId],
    ) as Promise<[number, number, number, number | null][]>,
    pool.query(
      {
        sql: `SELECT logger_id, MAX(id) FROM imports WHERE nursery_id = ? AND status = 'completed' AND logger_id IS NOT NULL GROUP BY logger_id`,
        rowsAsArray: true,
      },
      [nurseryId],
    ) as Promise<[number, number][]>,
    profilesOf(nurseryId),
  ]);

  const placementsOf = new Map<number, BatchStay[]>();
  for (const [batchId, id, roomId, from, to] of placementRows) {
    const list = placementsOf.get(batchId) ?? [];
    list.push({ id, roomId, from, to });
    placementsOf.set(batchId, list);
  }
  const staysByRoom = new Map<number, LoggerStay[]>();
  for (const [loggerId, roomId, from, to] of stayRows) {
    const list = staysByRoom.get(roomId) ?? [];
    list.push({ loggerId, roomId, from, to });
    staysByRoom.set(roomId, list);
  }
  return {
    batches: batchRows.map(([id, code, speciesKey, scionCultivar, rootstock, count, graftedOn, status]) => ({
      id, code, speciesKey, scionCultivar, rootstock, count, graftedOn, status, placements: placementsOf.get(id) ?? [],
    })),
    staysByRoom,
    generations: new Map(generationRows),
    profiles,
  };
}
