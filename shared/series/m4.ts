// M4 downsampling for line charts (Jugel, Jerzak, Hackenbroich & Markl, "M4: A Visualization-Oriented Time Series Data
// Aggregation", PVLDB 7(10), 2014): per pixel-column bucket keep the first, lowest, highest and last reading with their
// true instants. Drawn as a line, those at most 4·w points light exactly the pixels the full series would, so no dip
// or spike is lost however many readings there are.
import { bucketIndex, type BucketGrid } from './bucketGrid';
import { distinctPoints, mergeLater, summaryOf, type Summary, type TimedValue } from './summary';

/** A chart line: points in time order; a null value breaks the line (a gap longer than the join limit). */
export interface LinePoint {
  t: number;
  v: number | null;
}

export interface M4Builder {
  /**
   * Feed, in time order, readings or summaries of consecutive readings. A summary must lie inside one bucket and
   * contain no gap longer than maxGapMs (stored blocks are built that way).
   */
  push(piece: Summary): void;
  pushReading(t: number, v: number): void;
  /** The line so far plus the open bucket; call once at the end. */
  finish(): LinePoint[];
}

/**
 * Readings more than maxGapMs apart are not joined, matching the exposure engine's rule: the line breaks there (a
 * null point half-way through the gap), and the buckets on each side are summarised separately, so the break is
 * drawn even when it falls inside one pixel column.
 */
export function createM4(grid: BucketGrid, maxGapMs: number): M4Builder {
  const line: LinePoint[] = [];
  let open: Summary | null = null;
  let openBucket = NaN;

  function close(): void {
    if (open) for (const p of distinctPoints(open)) line.push(p);
    open = null;
  }

  function push(piece: Summary): void {
    const bucket = bucketIndex(grid, piece.first.t);
    if (open) {
      const previous: TimedValue = open.last;
      if (piece.first.t <= previous.t) throw new Error(`pieces out of time order: ${piece.first.t} after ${previous.t}`);
      if (piece.first.t - previous.t > maxGapMs) {
        close();
        line.push({ t: Math.round((previous.t + piece.first.t) / 2), v: null });
      } else if (bucket !== openBucket) {
        close();
      }
    }
    if (open) mergeLater(open, piece);
    else {
      open = { ...piece };
      openBucket = bucket;
    }
  }

  return {
    push,
    pushReading: (t, v) => push(summaryOf({ t, v })),
    finish() {
      close();
      return line;
    },
  };
}

/** M4 of a whole series of readings in time order. */
export function m4(readings: Iterable<TimedValue>, grid: BucketGrid, maxGapMs: number): LinePoint[] {
  const builder = createM4(grid, maxGapMs);
  for (const r of readings) builder.pushReading(r.t, r.v);
  return builder.finish();
}
