// Stored block summaries stand in for the readings on long ranges: the line built from blocks must be the line M4
// builds from every reading on the same grid.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { BlockSummary } from '../../../shared/series/blocks';
import { createBlockCascade, createBlockFolder } from '../../support/foldBlocks';
import { planBucketGrid } from '../../../shared/series/bucketGrid';
import { createM4, m4 } from '../../../shared/series/m4';
import { summaryOf, type TimedValue } from '../../../shared/series/summary';
import { BLOCK_MINUTES } from '../../../shared/series/bucketGrid';

const MINUTE = 60_000;
const T0 = Date.UTC(2026, 10, 2);

function fold(readings: TimedValue[], blockMs: number) {
  const blocks: BlockSummary[] = [];
  const folder = createBlockFolder(blockMs, (block) => blocks.push(block));
  for (const r of readings) folder.push(summaryOf(r));
  folder.finish();
  return blocks;
}

describe('block summaries', () => {
  it('summarise each 10-minute block with its own first, min, max and last (hand-computed)', () => {
    const at = (minute: number, v: number) => ({ t: T0 + minute * MINUTE, v });
    const blocks = fold([at(0, 2), at(3, -1), at(7, 4), at(9, 1), at(25, 3)], 10 * MINUTE);
    expect(blocks).toEqual([
      { start: T0, first: at(0, 2), min: at(3, -1), max: at(7, 4), last: at(9, 1) },
      { start: T0 + 20 * MINUTE, first: at(25, 3), min: at(25, 3), max: at(25, 3), last: at(25, 3) },
    ]);
  });

  it('fed to M4 instead of the readings, give the same line on a block grid', () => {
    // Readings 1–240 minutes apart over weeks, so some steps exceed the 180-minute join limit.
    const readings = fc
      .array(fc.record({ step: fc.integer({ min: 1, max: 240 }), v: fc.integer({ min: -800, max: 3000 }).map((k) => k / 100) }), { minLength: 1, maxLength: 600 })
      .map((steps) => {
        let t = T0 + 17 * 1000;
        return steps.map(({ step, v }) => ({ t: (t += step * MINUTE), v }));
      });
    fc.assert(
      fc.property(readings, fc.integer({ min: 2, max: 60 }), (rs, width) => {
        const grid = planBucketGrid(rs[0].t, rs.at(-1)!.t, width);
        fc.pre(grid.blockMinutes !== null);
        const maxGap = 180 * MINUTE;
        const fromBlocks = createM4(grid, maxGap);
        for (const block of fold(rs, grid.blockMinutes! * MINUTE)) fromBlocks.push(block);
        expect(fromBlocks.finish()).toEqual(m4(rs, grid, maxGap));
      }),
      { numRuns: 200 },
    );
  });

  it('folded size by size from the smallest, are the blocks each size gets from the readings (ties included)', () => {
    // Values on a coarse grid, so equal lowest and highest readings within a block are common.
    const readings = fc
      .array(fc.record({ step: fc.integer({ min: 1, max: 400 }), v: fc.integer({ min: -3, max: 3 }) }), { minLength: 1, maxLength: 800 })
      .map((steps) => {
        let t = T0 + 1234;
        return steps.map(({ step, v }) => ({ t: (t += step * 20_000), v }));
      });
    fc.assert(
      fc.property(readings, (rs) => {
        const cascaded = new Map<number, BlockSummary[]>(BLOCK_MINUTES.map((m) => [m, []]));
        const cascade = createBlockCascade(BLOCK_MINUTES, (minutes, block) => cascaded.get(minutes)!.push(block));
        for (const r of rs) cascade.push(summaryOf(r));
        cascade.finish();
        for (const minutes of BLOCK_MINUTES) expect(cascaded.get(minutes)).toEqual(fold(rs, minutes * MINUTE));
      }),
      { numRuns: 300 },
    );
  });
});
