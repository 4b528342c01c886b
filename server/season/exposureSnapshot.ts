// Freezes a batch's storage figures as they stood when part of it was planted out.
import { DateTime } from 'luxon';
import type { Pool } from 'mariadb';
import { toExposureReport } from '../../shared/exposure';
import type { ExposureSnapshot, RoomStay } from '../../shared/season/types';
import { stampParts } from '../exposure/exposureCache';
import { computeFigures } from '../exposure/exposureCompute';
import { loadExposureInputs } from '../exposure/exposureInputs';

const HOUR = 3_600_000;

/** Storage is counted up to the start of the planting day on the nursery's calendar. */
export function plantingInstant(plantedOn: string, timeZone: string): Date {
  return DateTime.fromISO(plantedOn, { zone: timeZone }).startOf('day').toJSDate();
}

/**
 * The batch's exposure over its placements up to `through`, computed afresh and not written to the exposure cache:
 * the cache holds figures as of now, and these are figures as of a day that may lie in the past.
 */
export async function exposureSnapshot(pool: Pool, nurseryId: number, batchId: number, through: Date): Promise<ExposureSnapshot> {
  const inputs = await loadExposureInputs(pool, nurseryId, { batchId });
  const [entry] = await computeFigures(pool, inputs.batches, inputs, stampParts(inputs), through.getTime());
  const names = new Map(
    ((await pool.query({ sql: 'SELECT id, name FROM rooms WHERE nursery_id = ?', rowsAsArray: true }, [nurseryId])) as [number, string][]),
  );
  const hoursByRoom = new Map<number, number>();
  for (const p of entry.figures.placements) hoursByRoom.set(p.roomId, (hoursByRoom.get(p.roomId) ?? 0) + (p.until - p.from) / HOUR);
  const rooms: RoomStay[] = [...hoursByRoom].map(([roomId, hours]) => ({ roomId, roomName: names.get(roomId) ?? `Room ${roomId}`, hours }));
  const exposure = entry.figures.exposure;
  return {
    through: through.toISOString(),
    exposure: exposure && exposure.hoursCovered > 0 ? toExposureReport(exposure) : null,
    rooms,
  };
}
