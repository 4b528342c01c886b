// A run of consecutive readings reduced to the four that a line chart needs: first, lowest, highest and last,
// each with its true instant. Runs merge without losing any of the four (M4's per-group aggregate).

/** One value at its instant (epoch ms, UTC). */
export interface TimedValue {
  t: number;
  v: number;
}

export interface Summary {
  first: TimedValue;
  min: TimedValue;
  max: TimedValue;
  last: TimedValue;
}

/** A single reading is its own summary. */
export function summaryOf(point: TimedValue): Summary {
  return { first: point, min: point, max: point, last: point };
}

/**
 * Adds a later run to `into` (in place). Ties keep the earlier extreme, so a summary built reading by reading and
 * one merged from smaller summaries pick the same readings.
 */
export function mergeLater(into: Summary, later: Summary): void {
  if (later.min.v < into.min.v) into.min = later.min;
  if (later.max.v > into.max.v) into.max = later.max;
  into.last = later.last;
}

/** The summary's readings in time order, each once (first, min, max and last are often the same reading). */
export function distinctPoints(s: Summary): TimedValue[] {
  const points = [s.first, s.min, s.max, s.last].sort((a, b) => a.t - b.t);
  return points.filter((p, i) => i === 0 || p.t !== points[i - 1].t);
}
