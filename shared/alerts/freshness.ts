// Whether a logger's last reading still speaks for the room at a given instant.
import { DEFAULT_MAX_GAP_MINUTES } from '../exposure/accumulator';
import type { Reading } from '../exposure/types';
import { lastAtOrBefore } from './series';

/** Readings further apart than the exposure engine joins are a gap, so an older last reading says nothing about t. */
const FRESH_MS = DEFAULT_MAX_GAP_MINUTES * 60_000;

export function freshReadingAt(readings: readonly Reading[], t: number): Reading | null {
  const last = lastAtOrBefore(readings, t);
  return last && t - last.t <= FRESH_MS ? last : null;
}
