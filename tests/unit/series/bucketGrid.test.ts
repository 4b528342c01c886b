// The bucket plan: pixel columns for short ranges, whole stored blocks (never more buckets than pixels) for long ones.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bucketIndex, bucketMs, planBucketGrid } from '../../../shared/series/bucketGrid';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;
const T0 = Date.UTC(2026, 10, 2, 6, 7, 8, 9);

describe('planBucketGrid', () => {
  it('24 h on 1,200 px: one bucket per pixel column from the readings (72 s each)', () => {
    const grid = planBucketGrid(T0, T0 + DAY - 1, 1200);
    expect(grid).toEqual({ origin: T0, span: DAY, count: 1200, blockMinutes: null });
    expect(bucketMs(grid)).toBe(72_000);
    expect(bucketIndex(grid, T0)).toBe(0);
    expect(bucketIndex(grid, T0 + DAY - 1)).toBe(1199);
  });

  it('a year on 1,200 px: 9-hour buckets of 3-hour blocks, aligned to the block grid (974 buckets)', () => {
    const grid = planBucketGrid(T0, T0 + 365 * DAY - 1, 1200);
    expect(grid.blockMinutes).toBe(180);
    expect(bucketMs(grid)).toBe(9 * HOUR);
    expect(grid.origin).toBe(Date.UTC(2026, 10, 2, 6));
    expect(grid.count).toBe(974);
  });

  it('a season of 150 days on 1,200 px: 4.5-hour buckets of 90-minute blocks, the coarsest case (800 buckets)', () => {
    const grid = planBucketGrid(T0, T0 + 150 * DAY - 1, 1200);
    expect([grid.blockMinutes, bucketMs(grid), grid.count]).toEqual([90, 4.5 * HOUR, 801]);
  });

  it('30 days on 1,200 px: 40-minute buckets of 10-minute blocks', () => {
    const grid = planBucketGrid(T0, T0 + 30 * DAY - 1, 1200);
    expect([grid.blockMinutes, bucketMs(grid)]).toEqual([10, 40 * MINUTE]);
  });

  it('7 days on 150 px (the overview sparkline): 90-minute buckets of 30-minute blocks', () => {
    const grid = planBucketGrid(T0, T0 + 7 * DAY - 1, 150);
    expect([grid.blockMinutes, bucketMs(grid), grid.count]).toEqual([30, 90 * MINUTE, 113]);
  });

  it('any range: between 2/3 of `width` and `width` buckets covering [from, to], block buckets of ≥ 3 whole aligned blocks', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3 * 365 * DAY }), fc.integer({ min: 0, max: 2 * 365 * DAY }), fc.integer({ min: 1, max: 4000 }), (offset, length, width) => {
        const from = T0 + offset;
        const to = from + length;
        const grid = planBucketGrid(from, to, width);
        expect(grid.count).toBeLessThanOrEqual(width);
        expect(grid.count).toBeGreaterThanOrEqual(Math.min(width, Math.floor((2 / 3) * width)));
        expect(bucketIndex(grid, from)).toBe(0);
        expect(bucketIndex(grid, to)).toBeLessThan(grid.count);
        if (grid.blockMinutes !== null) {
          const block = grid.blockMinutes * MINUTE;
          expect(grid.origin % block).toBe(0);
          expect(bucketMs(grid) % block).toBe(0);
          expect(bucketMs(grid) / block).toBeGreaterThanOrEqual(3);
        }
      }),
    );
  });

  it('rejects reversed ranges and widths below one', () => {
    expect(() => planBucketGrid(T0, T0 - 1, 100)).toThrow(/bad range/);
    expect(() => planBucketGrid(T0, T0 + 1, 0)).toThrow(/bad width/);
  });
});
