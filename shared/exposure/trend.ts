// Least-squares straight-line trend of temperature over time, and when that line reaches a limit.
import type { Reading } from './types';

const MS_PER_HOUR = 3_600_000;

export interface LinearTrend {
  slopeCPerHour: number;
  /** Temperature of the fitted line at instant t (epoch ms). */
  interceptAt(t: number): number;
}

/**
 * Ordinary least squares of c on t. Times are measured in hours from the first reading and centred before
 * squaring: raw epoch milliseconds squared (~10^24) would lose the digits that carry the slope.
 * Null when fewer than two distinct instants make the slope undefined.
 */
export function linearTrend(readings: readonly Reading[]): LinearTrend | null {
  if (readings.length < 2) return null;
  const origin = readings[0].t;
  let sumX = 0;
  let sumY = 0;
  for (const r of readings) {
    sumX += (r.t - origin) / MS_PER_HOUR;
    sumY += r.c;
  }
  const meanX = sumX / readings.length;
  const meanY = sumY / readings.length;
  let sxx = 0;
  let sxy = 0;
  for (const r of readings) {
    const dx = (r.t - origin) / MS_PER_HOUR - meanX;
    sxx += dx * dx;
    sxy += dx * (r.c - meanY);
  }
  if (sxx === 0) return null;
  const slopeCPerHour = sxy / sxx;
  return {
    slopeCPerHour,
    interceptAt: (t) => meanY + slopeCPerHour * ((t - origin) / MS_PER_HOUR - meanX),
  };
}

/**
 * The first instant at or after fromT (epoch ms) where the trend line equals limitC, or null when it never
 * does from there on (flat line off the limit, or a line moving away from it). A line already past the
 * limit and moving further also gives null: callers compare interceptAt(fromT) with the limit for that.
 */
export function timeToReach(limitC: number, trend: LinearTrend, fromT: number): number | null {
  const start = trend.interceptAt(fromT);
  if (start === limitC) return fromT;
  if (trend.slopeCPerHour === 0) return null;
  const hours = (limitC - start) / trend.slopeCPerHour;
  return hours >= 0 ? fromT + hours * MS_PER_HOUR : null;
}
