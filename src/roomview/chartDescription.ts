import { DateTime } from 'luxon';
import type { TemperatureUnit } from '../../shared/schemas/common';
import { extremesOf } from '../charts/chartPoints';
import { formatTemperature } from '../charts/displayUnits';
import type { RoomSeries } from '../charts/seriesTypes';

const STAMP = 'd LLL yyyy, HH:mm';

/** One sentence that says what the chart shows, for screen readers: range, lowest and highest with when, loggers. */
export function describeRoomChart(series: RoomSeries, roomName: string, unit: TemperatureUnit, timeZone: string): string {
  const at = (t: number | string) => (typeof t === 'number' ? DateTime.fromMillis(t, { zone: timeZone }) : DateTime.fromISO(t, { zone: timeZone })).toFormat(STAMP);
  const head = `Temperature in ${roomName} from ${at(series.from)} to ${at(series.to)}`;
  const extremes = extremesOf(series.loggers.map((l) => l.temperature));
  if (!extremes) return `${head}: no readings.`;
  const loggers = series.loggers.length === 1 ? `logger ${series.loggers[0].label}` : `${series.loggers.length} loggers`;
  return `${head}, ${loggers}: lowest ${formatTemperature(extremes.low.y, unit)} at ${at(extremes.low.x)}, highest ${formatTemperature(extremes.high.y, unit)} at ${at(extremes.high.x)}. The day table lists each day's low and high.`;
}
