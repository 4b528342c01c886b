// M4 as defined by Jugel et al., "M4: A Visualization-Oriented Time Series Data Aggregation", PVLDB 7(10), 2014:
// hand-computed buckets, gaps, and the paper's claim that the reduced line covers the same pixels in every column
// as the full one, checked against a plain rasteriser written here from geometry alone.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { BucketGrid } from '../../../shared/series/bucketGrid';
import { createM4, m4, type LinePoint } from '../../../shared/series/m4';
import { summaryOf, type TimedValue } from '../../../shared/series/summary';

/** Four buckets of 100 ms from 0. */
const GRID: BucketGrid = { origin: 0, span: 400, count: 4, blockMinutes: null };
const NO_GAPS = 1e9;
const pts = (...pairs: [number, number | null][]): LinePoint[] => pairs.map(([t, v]) => ({ t, v }));
const readings = (...pairs: [number, number][]): TimedValue[] => pairs.map(([t, v]) => ({ t, v }));

describe('M4 per bucket (hand-computed)', () => {
  it('keeps first, lowest, highest and last with their own instants, in time order', () => {
    const line = m4(readings([0, 5], [10, 3], [20, 3], [30, 9], [40, 9], [60, 6], [90, 4]), GRID, NO_GAPS);
    // Ties keep the earlier reading: min at 10 (not 20), max at 30 (not 40).
    expect(line).toEqual(pts([0, 5], [10, 3], [30, 9], [90, 4]));
  });

  it('a bucket with one reading gives one point; first = min = max gives two', () => {
    expect(m4(readings([150, 1]), GRID, NO_GAPS)).toEqual(pts([150, 1]));
    expect(m4(readings([200, 2], [250, 2]), GRID, NO_GAPS)).toEqual(pts([200, 2], [250, 2]));
  });

  it('min after max inside a bucket keeps that order', () => {
    expect(m4(readings([100, 4], [110, 8], [120, -1], [130, 2]), GRID, NO_GAPS)).toEqual(pts([100, 4], [110, 8], [120, -1], [130, 2]));
  });

  it('empty buckets give nothing, and the line runs on from the last bucket to the next', () => {
    expect(m4(readings([10, 1], [390, 2]), GRID, NO_GAPS)).toEqual(pts([10, 1], [390, 2]));
  });

  it('a fractional bucket width (a 1,000 ms range on 3 pixels) puts each reading in its column', () => {
    const grid: BucketGrid = { origin: 0, span: 1000, count: 3, blockMinutes: null };
    // Columns [0, 333.3), [333.3, 666.7), [666.7, 1000): 333 is in the first, 334 in the second.
    const line = m4(readings([0, 1], [100, 0], [333, 2], [334, 5], [666, 4], [667, 3], [999, 7]), grid, NO_GAPS);
    expect(line).toEqual(pts([0, 1], [100, 0], [333, 2], [334, 5], [666, 4], [667, 3], [999, 7]));
  });
});

describe('M4 gaps', () => {
  it('a step longer than the join limit breaks the line with a null half-way', () => {
    expect(m4(readings([0, 1], [50, 2], [151, 3]), GRID, 100)).toEqual(pts([0, 1], [50, 2], [101, null], [151, 3]));
  });

  it('a step of exactly the join limit is joined, as in the exposure engine', () => {
    expect(m4(readings([0, 1], [100, 2]), GRID, 100)).toEqual(pts([0, 1], [100, 2]));
  });

  it('a gap inside one bucket splits it: each side keeps its own first, min, max and last', () => {
    const line = m4(readings([0, 1], [5, 7], [10, 5], [60, 0], [65, -3], [70, 2]), GRID, 20);
    expect(line).toEqual(pts([0, 1], [5, 7], [10, 5], [35, null], [60, 0], [65, -3], [70, 2]));
  });

  it('refuses pieces out of time order', () => {
    const builder = createM4(GRID, NO_GAPS);
    builder.push(summaryOf({ t: 50, v: 1 }));
    expect(() => builder.push(summaryOf({ t: 50, v: 2 }))).toThrow(/out of time order/);
  });
});

// ---- properties against independent references ----

const MAX_GAP = 60;

/** Readings 1–90 ms apart (some past the 60 ms join limit), values at a logger's 0.01 resolution. */
const series = fc
  .array(fc.record({ step: fc.integer({ min: 1, max: 90 }), v: fc.integer({ min: -500, max: 500 }).map((k) => k / 100) }), { minLength: 1, maxLength: 300 })
  .map((steps) => {
    let t = 1_000;
    return steps.map(({ step, v }) => ({ t: (t += step), v }));
  });
const chart = fc.record({ before: fc.integer({ min: 0, max: 500 }), after: fc.integer({ min: 0, max: 500 }), width: fc.integer({ min: 1, max: 40 }) });
const gridFor = (rs: TimedValue[], c: { before: number; after: number; width: number }): BucketGrid => {
  const from = rs[0].t - c.before;
  return { origin: from, span: rs[rs.length - 1].t + c.after - from + 1, count: c.width, blockMinutes: null };
};

/** Runs of readings joined to each other: split wherever a step exceeds the limit. */
function joinedRuns(rs: TimedValue[], maxGap: number): TimedValue[][] {
  const runs: TimedValue[][] = [];
  rs.forEach((r, i) => {
    if (i === 0 || r.t - rs[i - 1].t > maxGap) runs.push([]);
    runs[runs.length - 1].push(r);
  });
  return runs;
}

/** Reference M4 written from the definition: group each run by column, sort, take the four. */
function referenceM4(rs: TimedValue[], grid: BucketGrid, maxGap: number): LinePoint[] {
  const out: LinePoint[] = [];
  const runs = joinedRuns(rs, maxGap);
  runs.forEach((run, k) => {
    if (k > 0) out.push({ t: Math.round((runs[k - 1].at(-1)!.t + run[0].t) / 2), v: null });
    const columns = new Map<number, TimedValue[]>();
    for (const r of run) {
      const col = Math.floor(((r.t - grid.origin) * grid.count) / grid.span);
      columns.set(col, [...(columns.get(col) ?? []), r]);
    }
    for (const group of columns.values()) {
      const byValue = [...group].sort((a, b) => a.v - b.v || a.t - b.t);
      const lowest = byValue[0];
      const highest = byValue.filter((r) => r.v === byValue.at(-1)!.v)[0];
      const chosen = new Set([group[0], lowest, highest, group.at(-1)!]);
      out.push(...[...chosen].sort((a, b) => a.t - b.t));
    }
  });
  return out;
}

/**
 * For each pixel column, the vertical extent the drawn polyline covers (x = continuous column coordinate). Lines
 * are not drawn across null points. This is what a 2-colour line renderer fills, before rounding to pixels.
 */
function columnExtents(line: LinePoint[], grid: BucketGrid): Map<number, [number, number]> {
  const x = (t: number) => ((t - grid.origin) * grid.count) / grid.span;
  const extents = new Map<number, [number, number]>();
  const note = (col: number, y: number) => {
    const e = extents.get(col);
    extents.set(col, e ? [Math.min(e[0], y), Math.max(e[1], y)] : [y, y]);
  };
  line.forEach((p, i) => {
    if (p.v === null) return;
    note(Math.floor(x(p.t)), p.v);
    const q = line[i + 1];
    if (!q || q.v === null) return;
    const [x0, x1] = [x(p.t), x(q.t)];
    // Ends are taken as they are: interpolating at an end would add rounding the renderer does not have.
    const yAt = (xx: number) => (xx === x0 ? p.v! : xx === x1 ? q.v! : p.v! + ((q.v! - p.v!) * (xx - x0)) / (x1 - x0));
    for (let col = Math.floor(x0); col <= Math.floor(x1); col++) {
      note(col, yAt(Math.max(col, x0)));
      note(col, yAt(Math.min(col + 1, x1)));
    }
  });
  return extents;
}

describe('M4 properties', () => {
  it('equals the reference grouping on random series with gaps', () => {
    fc.assert(
      fc.property(series, chart, (rs, c) => {
        const grid = gridFor(rs, c);
        expect(m4(rs, grid, MAX_GAP)).toEqual(referenceM4(rs, grid, MAX_GAP));
      }),
      { numRuns: 300 },
    );
  });

  it('covers exactly the same vertical extent in every column as the full line (Jugel et al. 2014, §4)', () => {
    fc.assert(
      fc.property(series, chart, (rs, c) => {
        const grid = gridFor(rs, c);
        const full = joinedRuns(rs, MAX_GAP).flatMap((run, k): LinePoint[] => (k > 0 ? [{ t: run[0].t - 1, v: null }, ...run] : run));
        expect(columnExtents(m4(rs, grid, MAX_GAP), grid)).toEqual(columnExtents(full, grid));
      }),
      { numRuns: 300 },
    );
  });

  it('never gives more than four points per column plus what gaps add', () => {
    fc.assert(
      fc.property(series, chart, (rs, c) => {
        const grid = gridFor(rs, c);
        const line = m4(rs, grid, MAX_GAP);
        const breaks = line.filter((p) => p.v === null).length;
        expect(line.length).toBeLessThanOrEqual(4 * grid.count + 5 * breaks);
      }),
    );
  });
});
