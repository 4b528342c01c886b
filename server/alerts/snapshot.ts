// Reads what the rules judge for one nursery: rooms with their batches and loggers, batches with their stays,
// placed loggers with their newest reading. Readings come as far back as the rules look.
import type { Pool } from 'mariadb';
import { SINCE_HORIZON_HOURS } from '../../shared/alerts/evaluateNursery';
import { OUT_OF_BAND_WINDOW_HOURS, nurseryThresholds, thresholdsFor, type ThresholdOverrides } from '../../shared/alerts/thresholds';
import type { BatchFacts, BatchSnapshot, BatchStay, LoggerSnapshot, NurserySnapshot, RoomSnapshot } from '../../shared/alerts/types';
import type { Reading } from '../../shared/exposure/types';
import { loadExposureInputs } from '../exposure/exposureInputs';
import { splitByLoggers } from '../exposure/spans';
import { loadSeries } from '../readings/readingSeries';

const MS_PER_HOUR = 3_600_000;

/** How far back any rule in any room may look from now: silence allowance + "since" horizon + the longest window. */
function lookbackHours(overrides: ThresholdOverrides, roomIds: number[]): number {
  const all = [nurseryThresholds(overrides), ...roomIds.map((id) => thresholdsFor(overrides, id))];
  return Math.max(...all.map((t) => t.silentHours + SINCE_HORIZON_HOURS + Math.max(OUT_OF_BAND_WINDOW_HOURS, t.freezeTrendHours)));
}

const budgetInUse = (overrides: ThresholdOverrides, roomIds: number[]) =>
  [nurseryThresholds(overrides), ...roomIds.map((id) => thresholdsFor(overrides, id))].some((t) => t.exposureBudgetDegreeHours !== null);

function toReadings(series: { t: Float64Array; c: Float64Array }): Reading[] {
  const out: Reading[] = new Array(series.t.length);
  for (let i = 0; i < series.t.length; i++) out[i] = { t: series.t[i], c: series.c[i] };
  return out;
}

const within = (readings: Reading[], from: number, to: number) => readings.filter((r) => r.t >= from && r.t <= to);

export async function loadSnapshot(pool: Pool, nurseryId: number, overrides: ThresholdOverrides, now: number): Promise<NurserySnapshot> {
  const [inputs, roomRows, loggerRows] = await Promise.all([
    loadExposureInputs(pool, nurseryId, 'in_storage'),
    pool.query({ sql: 'SELECT id, name FROM rooms WHERE nursery_id = ? ORDER BY name', rowsAsArray: true }, [nurseryId]) as Promise<[number, string][]>,
    pool.query({ sql: 'SELECT id, label FROM loggers WHERE nursery_id = ?', rowsAsArray: true }, [nurseryId]) as Promise<[number, string][]>,
  ]);
  const roomNames = new Map(roomRows);
  const labels = new Map(loggerRows);
  const roomIds = roomRows.map(([id]) => id);

  // Open placements of batches still in storage: where each batch is now.
  const current = inputs.batches
    .map((b) => ({ batch: b, placement: b.placements.at(-1) }))
    .filter((x) => x.placement && x.placement.to === null && x.placement.from <= now);
  let from = now - lookbackHours(overrides, roomIds) * MS_PER_HOUR;
  if (budgetInUse(overrides, roomIds)) {
    // The budget counts a batch's whole stay so far, so its first placement sets how far back readings are needed.
    for (const { batch } of current) from = Math.min(from, batch.placements[0].from);
  }

  const stays = [...inputs.staysByRoom.values()].flat().filter((s) => s.from <= now && (s.to === null || s.to >= from));
  const loggerIds = [...new Set(stays.map((s) => s.loggerId))];
  const series = new Map<number, Reading[]>();
  await Promise.all(loggerIds.map(async (id) => series.set(id, toReadings(await loadSeries(pool, id, from, now)))));
  const newest = loggerIds.length
    ? ((await pool.query(
        { sql: `SELECT logger_id, CAST(UNIX_TIMESTAMP(MAX(t)) * 1000 AS SIGNED) FROM readings WHERE logger_id IN (?) GROUP BY logger_id`, rowsAsArray: true },
        [loggerIds],
      )) as [number, number][])
    : [];
  const lastReadingAt = new Map(newest);

  const facts = (b: (typeof current)[number]['batch']): BatchFacts => {
    const profile = inputs.profiles.get(b.speciesKey)!;
    return {
      batchId: b.id, code: b.code, speciesName: profile.name, count: b.count,
      band: profile.band, freezeC: profile.freezeC, storageMaxC: profile.storageMaxC,
    };
  };

  const rooms: RoomSnapshot[] = roomRows.map(([roomId, name]) => ({
    roomId,
    name,
    batches: current.filter((x) => x.placement!.roomId === roomId).map((x) => facts(x.batch)),
    loggers: stays
      .filter((s) => s.roomId === roomId)
      .map((s) => ({ loggerId: s.loggerId, label: labels.get(s.loggerId) ?? `#${s.loggerId}`, readings: within(series.get(s.loggerId)!, s.from, s.to ?? now) })),
  }));

  const batches: BatchSnapshot[] = current.map(({ batch, placement }) => {
    const batchStays: BatchStay[] = batch.placements.flatMap((p) =>
      splitByLoggers({ from: p.from, to: p.to ?? now }, inputs.staysByRoom.get(p.roomId) ?? [])
        .filter((piece) => piece.to >= from && piece.loggerIds.length > 0)
        .map((piece) => ({
          roomId: p.roomId,
          from: piece.from,
          to: piece.to,
          loggers: piece.loggerIds.map((loggerId) => ({ loggerId, readings: series.get(loggerId) ?? [], from: piece.from, to: piece.to })),
        })),
    );
    return { ...facts(batch), roomId: placement!.roomId, stays: batchStays };
  });

  const loggers: LoggerSnapshot[] = stays
    .filter((s) => s.to === null)
    .map((s) => ({
      loggerId: s.loggerId,
      label: labels.get(s.loggerId) ?? `#${s.loggerId}`,
      roomId: s.roomId,
      roomName: roomNames.get(s.roomId) ?? '',
      placedFrom: s.from,
      lastReadingAt: lastReadingAt.get(s.loggerId) ?? null,
    }));

  return { nurseryId, rooms, batches, loggers };
}
