// Lookups in time-ordered readings by bisection: evaluations judge many instants of the same series.
import type { Reading } from '../exposure/types';

/** Index of the first reading at or after t (readings.length when none). */
function firstAtOrAfter(readings: readonly Reading[], t: number): number {
  let lo = 0;
  let hi = readings.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (readings[mid].t < t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Index of the first reading after t (readings.length when none). */
function firstAfter(readings: readonly Reading[], t: number): number {
  let lo = 0;
  let hi = readings.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (readings[mid].t <= t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export function lastAtOrBefore(readings: readonly Reading[], t: number): Reading | null {
  const i = firstAfter(readings, t) - 1;
  return i >= 0 ? readings[i] : null;
}

/** Readings with from ≤ t ≤ to. */
export function readingsWithin(readings: readonly Reading[], from: number, to: number): Reading[] {
  return readings.slice(firstAtOrAfter(readings, from), firstAfter(readings, to));
}

/**
 * The readings inside [from, to] plus the nearest one on each side, which the joined line needs to reach the
 * window's edges; the exposure engine clips to the window itself.
 */
export function readingsAround(readings: readonly Reading[], from: number, to: number): Reading[] {
  const start = Math.max(0, firstAfter(readings, from) - 1);
  const end = Math.min(readings.length, firstAtOrAfter(readings, to) + 1);
  return readings.slice(start, end);
}

/** Every instant at which any of the series has a reading inside [from, to], ascending and without repeats. */
export function instantsWithin(series: readonly (readonly Reading[])[], from: number, to: number): number[] {
  const set = new Set<number>();
  for (const readings of series) for (const r of readingsWithin(readings, from, to)) set.add(r.t);
  return [...set].sort((a, b) => a - b);
}
