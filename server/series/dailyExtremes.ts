import { DateTime } from 'luxon';
import type { Pool } from 'mariadb';
import type { Summary } from '../../shared/series/summary';
import { Nursery } from '../nurseries/nursery.model';
import { findRoom } from '../rooms/rooms.service';
import { loggersInRoom } from './placementWindows';
import { readPieces } from './readingPieces';

interface Day {
  date: string;
  start: number;
}

/** The nursery's calendar days that [from, to] touches, each with the instant its local midnight falls on. */
function localDays(from: number, to: number, zone: string): Day[] {
  const days: Day[] = [];
  for (let d = DateTime.fromMillis(from, { zone }).startOf('day'); d.toMillis() <= to; d = d.plus({ days: 1 })) {
    days.push({ date: d.toISODate()!, start: d.toMillis() });
  }
  return days;
}

interface Extremes {
  min: Summary['min'];
  max: Summary['max'];
}

/** Lowest and highest per day; pieces arrive in time order and none straddles a midnight. */
function extremesByDay(pieces: readonly Summary[], days: readonly Day[]): Map<string, Extremes> {
  const out = new Map<string, Extremes>();
  let d = 0;
  for (const p of pieces) {
    while (d + 1 < days.length && p.first.t >= days[d + 1].start) d++;
    const e = out.get(days[d].date);
    if (!e) out.set(days[d].date, { min: p.min, max: p.max });
    else {
      if (p.min.v < e.min.v) e.min = p.min;
      if (p.max.v > e.max.v) e.max = p.max;
    }
  }
  return out;
}

/**
 * The lowest and highest temperature of each logger in the room for each day of the nursery's calendar in
 * [from, to]: the table that stands beside the chart for people who cannot see it. 30-minute blocks serve whole
 * half hours; a block that a local midnight cuts (zones offset by a quarter hour) is read reading by reading.
 */
export async function dailyExtremes(pool: Pool, nurseryId: number, roomId: number, range: { from: Date; to: Date }) {
  const room = await findRoom(nurseryId, roomId);
  const { timeZone } = (await Nursery.findByPk(nurseryId))!;
  const from = range.from.getTime();
  const to = range.to.getTime();
  const days = localDays(from, to, timeZone);
  const cuts = days.map((d) => d.start);
  const loggers = await loggersInRoom(room.id, from, to);
  const perLogger = await Promise.all(
    loggers.map(async (logger) => {
      const pieces: Summary[] = [];
      for (const w of logger.windows) pieces.push(...(await readPieces(pool, logger.loggerId, w.from, w.to, 30, cuts)).c);
      return { logger, byDay: extremesByDay(pieces, days) };
    }),
  );
  const iso = (t: number) => new Date(t).toISOString();
  return {
    roomId: room.id,
    timeZone,
    days: days.map((day) => ({
      date: day.date,
      loggers: perLogger.flatMap(({ logger, byDay }) => {
        const e = byDay.get(day.date);
        return e ? [{ id: logger.loggerId, label: logger.label, min: { t: iso(e.min.t), c: e.min.v }, max: { t: iso(e.max.t), c: e.max.v } }] : [];
      }),
    })),
  };
}
