// Stored chart blocks are summarised by MariaDB (the smallest size, with packed MIN/MAX) and folded upwards; they must
// be exactly the blocks that folding every stored reading gives, humidity gaps, negative values and ties included.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BlockSummary } from '../../../shared/series/blocks';
import { createBlockCascade } from '../../support/foldBlocks';
import { BLOCK_MINUTES } from '../../../shared/series/bucketGrid';
import { summaryOf } from '../../../shared/series/summary';
import { readBlocks } from '../../../server/series/blockStore';
import { ensureBlocksCurrent } from '../../../server/series/blockRefresh';
import { signIn, startTestApp, type TestApp } from '../../support/testApp';
import { roomWithLogger, storeReadings, type Row } from './storedReadings';

const MINUTE = 60_000;
const START = Date.UTC(2026, 0, 3, 7, 3, 17, 250);

/** What folding the readings themselves gives, per quantity and size, at the columns' precision. */
function folded(rows: Row[]) {
  const out = new Map<string, BlockSummary[]>();
  for (const quantity of ['c', 'rh'] as const) {
    for (const minutes of BLOCK_MINUTES) out.set(`${quantity}/${minutes}`, []);
    const cascade = createBlockCascade(BLOCK_MINUTES, (minutes, block) => out.get(`${quantity}/${minutes}`)!.push(block));
    for (const r of rows) {
      const v = quantity === 'c' ? Math.round(r.c * 10_000) / 10_000 : r.rh == null ? null : Math.round(r.rh * 100) / 100;
      if (v !== null) cascade.push(summaryOf({ t: r.t, v }));
    }
    cascade.finish();
  }
  return out;
}

describe('chart blocks rebuilt from stored readings', () => {
  let t: TestApp;
  let nurseryId: number;
  let owner: Awaited<ReturnType<typeof signIn>>;
  beforeAll(async () => {
    t = await startTestApp();
    owner = await signIn(t.app, 'owner@example.com');
    nurseryId = (await owner.get('/api/auth/me')).body.nursery.id;
  });
  afterAll(() => t.close());

  it('equal the blocks folded from every reading (random series over several fortnights, property test)', async () => {
    // Steps from one second to five hours, values on a coarse grid so equal extremes in one block are common.
    const series = fc
      .array(
        fc.record({
          step: fc.oneof(fc.integer({ min: 1_000, max: 120_000 }), fc.integer({ min: 60_000, max: 300 * MINUTE })),
          c: fc.integer({ min: -40, max: 40 }).map((k) => k / 4),
          rh: fc.option(fc.integer({ min: 0, max: 20 }).map((k) => k * 5), { nil: null, freq: 3 }),
        }),
        { minLength: 1, maxLength: 1500 },
      )
      .map((steps) => {
        let at = START;
        return steps.map(({ step, c, rh }) => ({ t: (at += step), c, rh }));
      });
    await fc.assert(
      fc.asyncProperty(series, async (rows) => {
        const { loggerId } = await roomWithLogger(owner, new Date(START));
        await storeReadings(t.pool, nurseryId, loggerId, rows.length, (i) => rows[i]);
        await ensureBlocksCurrent(t.pool, loggerId);
        const expected = folded(rows);
        for (const minutes of BLOCK_MINUTES) {
          const stored = await readBlocks(t.pool, loggerId, minutes, { from: 0, to: Date.UTC(2100, 0, 1) });
          expect(stored.c).toEqual(expected.get(`c/${minutes}`));
          expect(stored.rh).toEqual(expected.get(`rh/${minutes}`));
        }
      }),
      { numRuns: 15 },
    );
  });
});
