// Whether a logger's latest reading is too old to trust as "now".

const HOUR = 3_600_000;

/** Readings arrive by file import, often nightly: a day plus two hours of slack before a room reads as stale. */
export const STALE_FLOOR_MS = 26 * HOUR;
const STALE_INTERVALS = 3;

/** The logger's usual spacing: the median step between its recent readings (epoch ms, any order); null below two. */
export function loggingIntervalMs(recent: readonly number[]): number | null {
  const sorted = [...recent].sort((a, b) => a - b);
  const steps = sorted.slice(1).map((t, i) => t - sorted[i]).filter((d) => d > 0).sort((a, b) => a - b);
  if (steps.length === 0) return null;
  const mid = steps.length >> 1;
  return steps.length % 2 ? steps[mid] : (steps[mid - 1] + steps[mid]) / 2;
}

/**
 * Stale after three logging intervals or 26 h, whichever is longer: three intervals alone would flag every room
 * between nightly imports of a 10-minute logger, while a logger that records every 12 h is not late after 26 h.
 */
export function staleAfterMs(intervalMs: number | null): number {
  return Math.max(STALE_FLOOR_MS, STALE_INTERVALS * (intervalMs ?? 0));
}

export function isStale(latestT: number, intervalMs: number | null, now: number): boolean {
  return now - latestT > staleAfterMs(intervalMs);
}
