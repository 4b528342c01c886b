// What the daily digest reports: each room's last 24 hours, the open alerts, the batches close to full callus.
import type { Pool } from 'mariadb';
import { computeExposure } from '../../shared/exposure/accumulator';
import { worstOf } from '../../shared/exposure/combine';
import type { Exposure } from '../../shared/exposure/types';
import { nurseryExposure } from '../exposure/exposure.service';
import { loadSeries } from '../readings/readingSeries';
import { Alert } from './alert.model';
import { toAlertView, type AlertView } from './alertView';

const MS_PER_HOUR = 3_600_000;

/** "Nearing full callus" [DESIGN]: at least 80 % of the way, or full callus expected within three days. */
const NEARING_PCT = 80;
const NEARING_HOURS = 72;

export interface RoomDay {
  roomId: number;
  name: string;
  minC: number | null;
  maxC: number | null;
  meanC: number | null;
}

export interface NearingBatch {
  batchId: number;
  code: string;
  speciesName: string;
  count: number;
  roomName: string | null;
  progressPct: number;
  fullCallusAt: number | null;
}

export interface DigestData {
  rooms: RoomDay[];
  alerts: AlertView[];
  nearing: NearingBatch[];
}

/** Per room, the worst of its loggers as in the room chart: lowest minimum, highest maximum, best-covered mean. */
async function roomDays(pool: Pool, nurseryId: number, now: number): Promise<RoomDay[]> {
  const from = now - 24 * MS_PER_HOUR;
  const [rooms, stays] = await Promise.all([
    pool.query({ sql: 'SELECT id, name FROM rooms WHERE nursery_id = ? ORDER BY name', rowsAsArray: true }, [nurseryId]) as Promise<[number, string][]>,
    pool.query(
      {
        sql: `SELECT p.room_id, p.logger_id, CAST(UNIX_TIMESTAMP(p.placed_from) * 1000 AS SIGNED), CAST(UNIX_TIMESTAMP(p.placed_to) * 1000 AS SIGNED)
                FROM logger_placements p JOIN loggers l ON l.id = p.logger_id
               WHERE l.nursery_id = ? AND p.placed_from < ? AND (p.placed_to IS NULL OR p.placed_to > ?)`,
        rowsAsArray: true,
      },
      [nurseryId, new Date(now), new Date(from)],
    ) as Promise<[number, number, number, number | null][]>,
  ]);
  const result: RoomDay[] = [];
  for (const [roomId, name] of rooms) {
    const exposures: Exposure[] = [];
    for (const [stayRoom, loggerId, placedFrom, placedTo] of stays) {
      if (stayRoom !== roomId) continue;
      const a = Math.max(from, placedFrom);
      const b = Math.min(now, placedTo ?? now);
      const series = await loadSeries(pool, loggerId, a, b);
      const readings = Array.from(series.t, (t, i) => ({ t, c: series.c[i] }));
      // Only the extremes and the mean are wanted; the band and freeze limit do not affect them.
      exposures.push(computeExposure(readings, { band: { minC: 0, maxC: 0 }, freezeC: 0, from: a, to: b }));
    }
    const day = exposures.length ? worstOf(exposures) : null;
    result.push({ roomId, name, minC: day?.minC ?? null, maxC: day?.maxC ?? null, meanC: day?.meanC ?? null });
  }
  return result;
}

async function nearingBatches(pool: Pool, nurseryId: number, now: number): Promise<NearingBatch[]> {
  const { rows } = await nurseryExposure(pool, nurseryId, now);
  const out: NearingBatch[] = [];
  for (const row of rows) {
    const progress = row.progress;
    if (!progress) continue;
    const fullCallusAt = progress.outlook.fullCallusAt ? Date.parse(progress.outlook.fullCallusAt) : null;
    const soon = fullCallusAt !== null && fullCallusAt - now <= NEARING_HOURS * MS_PER_HOUR;
    if (progress.progressPct < NEARING_PCT && !soon) continue;
    out.push({
      batchId: row.batchId, code: row.code, speciesName: row.speciesName, count: row.count, roomName: row.roomName,
      progressPct: progress.progressPct, fullCallusAt,
    });
  }
  return out.sort((a, b) => b.progressPct - a.progressPct);
}

export async function loadDigestData(pool: Pool, nurseryId: number, now: number): Promise<DigestData> {
  const [rooms, alerts, nearing] = await Promise.all([
    roomDays(pool, nurseryId, now),
    Alert.findAll({ where: { nurseryId, status: ['open', 'acknowledged'] }, order: [['severity', 'DESC'], ['openedAt', 'ASC']] }),
    nearingBatches(pool, nurseryId, now),
  ]);
  return { rooms, alerts: alerts.map(toAlertView), nearing };
}
