import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SeenReadings } from '../../../shared/import/seenReadings';

// The reference is a plain Map from time to reading: SeenReadings must answer every look-up exactly as it does,
// whatever order the times come in (oldest first, newest first, or shuffled).
describe('SeenReadings', () => {
  const run = (times: readonly number[]) => {
    const seen = new SeenReadings();
    const reference = new Map<number, [number, number, number]>();
    times.forEach((t, i) => {
      const found = seen.find(t);
      expect(found).toBe(reference.has(t));
      if (found) {
        const [c, rh, line] = reference.get(t)!;
        expect([seen.foundC, seen.foundRh, seen.foundLine]).toEqual([c, rh, line]);
        return;
      }
      const reading: [number, number, number] = [t / 1000 + 0.5, i % 3 === 0 ? Number.NaN : i % 100, i + 1];
      seen.add(t, ...reading);
      reference.set(t, reading);
    });
  };

  it('answers like a Map for series oldest first, newest first and shuffled, with repeats', () => {
    const series = fc.array(fc.integer({ min: 0, max: 5 }), { minLength: 1, maxLength: 300 }).chain((steps) => {
      let t = 1_700_000_000_000;
      const ascending = steps.map((s) => (t += s * 30_000));
      return fc.oneof(
        fc.constant(ascending),
        fc.constant([...ascending].reverse()),
        fc.shuffledSubarray(ascending, { minLength: ascending.length, maxLength: ascending.length }),
        // In order, with a stretch pasted in again further down (a re-export appended to itself).
        fc.constant([...ascending, ...ascending.slice(0, Math.ceil(ascending.length / 3))]),
      );
    });
    fc.assert(fc.property(series, run), { numRuns: 500 });
  });

  it('keeps a newest-first file in its typed blocks, not in the Map', () => {
    const seen = new SeenReadings();
    for (let i = 0; i < 200_000; i++) seen.add(1_700_000_000_000 - i * 30_000, 3, Number.NaN, i + 1);
    expect((seen as unknown as { outOfOrder: Map<number, unknown> }).outOfOrder.size).toBe(0);
    expect(seen.find(1_700_000_000_000 - 12_345 * 30_000)).toBe(true);
    expect(seen.foundLine).toBe(12_346);
  });
});
