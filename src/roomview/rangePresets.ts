// The chart's range choices. Ranges end now; "season" starts on the first day of the grafting season the nursery's
// calendar is in (1 July, as the season report counts seasons), or when a logger first came into the room, if later.
import { DateTime } from 'luxon';
import { seasonDates, seasonOf } from '../../shared/season/seasonOf';
import type { TimeRange } from './queries';

export const PRESETS = [
  { key: '24h', label: '24 h' },
  { key: '7d', label: '7 days' },
  { key: '30d', label: '30 days' },
  { key: 'season', label: 'Season' },
] as const;
export type PresetKey = (typeof PRESETS)[number]['key'];

const HOUR = 3_600_000;
const SPANS: Record<Exclude<PresetKey, 'season'>, number> = { '24h': 24 * HOUR, '7d': 7 * 24 * HOUR, '30d': 30 * 24 * HOUR };

export function presetRange(key: PresetKey, now: number, timeZone: string, firstWatched: number | null = null): TimeRange {
  if (key !== 'season') return { from: now - SPANS[key], to: now };
  const today = DateTime.fromMillis(now, { zone: timeZone }).toISODate()!;
  const start = DateTime.fromISO(seasonDates(seasonOf(today)).from, { zone: timeZone }).startOf('day').toMillis();
  return { from: firstWatched !== null && firstWatched > start && firstWatched < now ? firstWatched : start, to: now };
}

/** Charts ask the server for one bucket per device pixel, in steps of 50 so small resizes reuse the cached answer. */
export function requestWidth(cssPixels: number, devicePixelRatio: number): number {
  const pixels = cssPixels * Math.min(Math.max(devicePixelRatio, 1), 2);
  return Math.min(4000, Math.max(50, Math.ceil(pixels / 50) * 50));
}
