// Exposure of one logger's series over many (possibly overlapping) windows, each reading fed to the engine once.
import { createExposureAccumulator, sumExposures, type Exposure } from '../../shared/exposure';
import type { EngineOptions } from './engineOptions';
import type { Span } from './spans';

/** One logger's readings in time order, as parallel arrays (epoch ms, °C). */
export interface Series {
  t: Float64Array;
  c: Float64Array;
}

/** Index of the last reading at or before `at`, or 0 when all are later. */
function lastAtOrBefore(t: Float64Array, at: number): number {
  let lo = 0;
  let hi = t.length - 1;
  let found = 0;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (t[mid] <= at) {
      found = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

/** The engine over [from, to] with the readings around it, so the joined line is clipped exactly at both ends. */
export function exposureOfSpan(series: Series, span: Span, options: EngineOptions): Exposure {
  const accumulator = createExposureAccumulator({ ...options, from: span.from, to: span.to });
  const { t, c } = series;
  if (t.length > 0) {
    for (let i = lastAtOrBefore(t, span.from); i < t.length; i++) {
      accumulator.push(t[i], c[i]);
      if (t[i] >= span.to) break;
    }
  }
  return accumulator.result();
}

/**
 * Exposure over each window, in the order given. All window ends cut the time line into elementary pieces;
 * each piece needed by some window goes through the engine once (clipped exactly at its ends), and a window is
 * the sum of its pieces (sumExposures). Many batches sharing a room and overlapping in time thus cost one pass
 * over the logger's readings per species profile, not one per batch.
 */
export function exposuresOverWindows(series: Series, windows: readonly Span[], options: EngineOptions): Exposure[] {
  if (windows.length === 0) return [];
  const cuts = [...new Set(windows.flatMap((w) => [w.from, w.to]))].sort((a, b) => a - b);
  const indexOf = new Map(cuts.map((cut, i) => [cut, i]));
  const depth = new Int32Array(cuts.length);
  for (const w of windows) {
    if (!(w.to > w.from)) throw new Error(`window [${w.from}, ${w.to}] is empty`);
    depth[indexOf.get(w.from)!] += 1;
    depth[indexOf.get(w.to)!] -= 1;
  }
  const pieces: (Exposure | null)[] = [];
  let open = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    open += depth[i];
    pieces.push(open > 0 ? exposureOfSpan(series, { from: cuts[i], to: cuts[i + 1] }, options) : null);
  }
  return windows.map((w) => {
    const needed = pieces.slice(indexOf.get(w.from)!, indexOf.get(w.to)!) as Exposure[];
    return needed.length === 1 ? needed[0] : sumExposures(needed);
  });
}
