import { describe, expect, it } from 'vitest';
import { isStale, loggingIntervalMs, staleAfterMs, STALE_FLOOR_MS } from '../../../shared/series/freshness';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

describe('logging interval', () => {
  it('is the median step, robust to one missed reading and to order', () => {
    expect(loggingIntervalMs([50, 0, 10, 20, 30].map((m) => m * MINUTE))).toBe(10 * MINUTE);
    expect(loggingIntervalMs([0, 10, 20, 25].map((m) => m * MINUTE))).toBe(10 * MINUTE);
    expect(loggingIntervalMs([0, 5, 15, 20].map((m) => m * MINUTE))).toBe(5 * MINUTE);
  });

  it('is unknown with fewer than two distinct instants', () => {
    expect(loggingIntervalMs([])).toBeNull();
    expect(loggingIntervalMs([7, 7])).toBeNull();
  });
});

describe('staleness', () => {
  it('a 10-minute logger imported nightly is stale only after 26 h', () => {
    expect(staleAfterMs(10 * MINUTE)).toBe(26 * HOUR);
    expect(isStale(0, 10 * MINUTE, 26 * HOUR)).toBe(false);
    expect(isStale(0, 10 * MINUTE, 26 * HOUR + 1)).toBe(true);
  });

  it('a logger recording every 12 h is stale after three intervals (36 h)', () => {
    expect(staleAfterMs(12 * HOUR)).toBe(36 * HOUR);
    expect(isStale(0, 12 * HOUR, 30 * HOUR)).toBe(false);
  });

  it('an unknown interval falls back to 26 h', () => {
    expect(staleAfterMs(null)).toBe(STALE_FLOOR_MS);
  });
});
