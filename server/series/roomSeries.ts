import type { Pool } from 'mariadb';
import { DEFAULT_MAX_GAP_MINUTES } from '../../shared/exposure/accumulator';
import { bucketMs, planBucketGrid, type BucketGrid } from '../../shared/series/bucketGrid';
import { createM4 } from '../../shared/series/m4';
import type { LoggerLines } from '../../shared/series/loggerLines';
import { packLine } from '../../shared/series/packedLine';
import { findRoom } from '../rooms/rooms.service';
import { loggersInRoom, type LoggerInRoom } from './placementWindows';
import { roomBatchMarks } from './roomBatches';
import { readPieces } from './readingPieces';

const MINUTE = 60_000;
/** Lines break where the exposure engine stops joining readings, so the chart shows the same gaps the figures count. */
export const MAX_GAP_MS = DEFAULT_MAX_GAP_MINUTES * MINUTE;

const iso = (t: number) => new Date(t).toISOString();

/** One logger's temperature and humidity lines over its stays in the room, M4-reduced on the chart's grid. */
export async function loggerLines(pool: Pool, logger: LoggerInRoom, grid: BucketGrid): Promise<LoggerLines> {
  const temperature = createM4(grid, MAX_GAP_MS);
  const humidity = createM4(grid, MAX_GAP_MS);
  let anyHumidity = false;
  for (const w of logger.windows) {
    const pieces = await readPieces(pool, logger.loggerId, w.from, w.to, grid.blockMinutes);
    for (const p of pieces.c) temperature.push(p);
    for (const p of pieces.rh) humidity.push(p);
    anyHumidity ||= pieces.rh.length > 0;
  }
  return {
    id: logger.loggerId,
    label: logger.label,
    windows: logger.windows.map((w) => ({ from: iso(w.from), to: iso(w.to) })),
    temperature: packLine(temperature.finish()),
    humidity: anyHumidity ? packLine(humidity.finish()) : null,
  };
}

/**
 * The room chart's data: for every logger that was in the room during [from, to], its readings reduced with M4 to at
 * most four points per pixel column of a chart `width` pixels wide, every extreme kept at its true instant; and the
 * species bands, freeze limits and batch moves to draw with them.
 */
export async function roomSeries(pool: Pool, nurseryId: number, roomId: number, range: { from: Date; to: Date; width: number }) {
  const room = await findRoom(nurseryId, roomId);
  const from = range.from.getTime();
  const to = range.to.getTime();
  const grid = planBucketGrid(from, to, range.width);
  const [loggers, marks] = await Promise.all([loggersInRoom(room.id, from, to), roomBatchMarks(nurseryId, room.id, from, to)]);
  return {
    roomId: room.id,
    from: iso(from),
    to: iso(to),
    width: range.width,
    bucketMs: bucketMs(grid),
    blockMinutes: grid.blockMinutes,
    maxGapMinutes: DEFAULT_MAX_GAP_MINUTES,
    loggers: await Promise.all(loggers.map((l) => loggerLines(pool, l, grid))),
    ...marks,
  };
}
