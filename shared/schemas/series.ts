import { z } from 'zod';
import { isoInstant } from './common';

const DAY = 86_400_000;
/** Longer than any storage season, short enough that a request cannot ask for decades of readings. */
export const MAX_SERIES_DAYS = 3 * 366;
/** The day table lists one row per day; a season or a year fits. */
export const MAX_DAILY_DAYS = 400;

/** Range checks only once both ends parsed; an unreadable instant is reported on its own. */
const bothEndsRead = (payload: z.core.ParsePayload) => payload.issues.length === 0;

const range = (maxDays: number) =>
  z
    .object({ from: isoInstant, to: isoInstant })
    .refine((r) => r.to.getTime() > r.from.getTime(), { message: '`to` must be after `from`', path: ['to'], when: bothEndsRead })
    .refine((r) => r.to.getTime() - r.from.getTime() <= maxDays * DAY, { message: `the range may span at most ${maxDays} days`, path: ['to'], when: bothEndsRead });

/** A room chart: the range and the chart's width in pixels (one M4 bucket per pixel column). */
export const seriesQuery = z.intersection(range(MAX_SERIES_DAYS), z.object({ width: z.coerce.number().int().min(16).max(4000) }));
export const dailyQuery = range(MAX_DAILY_DAYS);
