// Many windows over one logger's series at once must give what the shared engine gives for each window on its own.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeExposure, type Reading } from '../../../shared/exposure';
import { exposuresOverWindows, type Series } from '../../../server/exposure/windowSolver';

const MINUTE = 60_000;
const T0 = Date.UTC(2026, 10, 2);
const OPTIONS = { band: { minC: 0, maxC: 7 }, freezeC: -2, callus: { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32, hoursAtOptimum: 336 } };

const toSeries = (readings: Reading[]): Series => ({ t: Float64Array.from(readings, (r) => r.t), c: Float64Array.from(readings, (r) => r.c) });

/** Every number equal to 1e-9 (relative above 1), everything else identical. */
function expectClose(actual: unknown, expected: unknown, path = 'exposure'): void {
  if (typeof expected === 'number') {
    expect(Math.abs((actual as number) - expected), path).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
  } else if (expected && typeof expected === 'object') {
    expect(Object.keys(actual as object).sort(), path).toEqual(Object.keys(expected).sort());
    for (const [k, v] of Object.entries(expected)) expectClose((actual as Record<string, unknown>)[k], v, `${path}.${k}`);
  } else expect(actual, path).toBe(expected);
}

// Readings 1–240 minutes apart (some gaps longer than the engine's 180-minute join), −8…30 °C in 0.01 °C steps.
const readings = fc
  .array(fc.record({ gap: fc.integer({ min: 1, max: 240 }), c: fc.integer({ min: -800, max: 3000 }) }), { minLength: 2, maxLength: 120 })
  .map((steps) => {
    let t = T0;
    return steps.map(({ gap, c }) => ({ t: (t += gap * MINUTE), c: c / 100 }));
  });

describe('exposuresOverWindows', () => {
  it('answers each of many overlapping windows as the engine does on that window alone (reference: shared computeExposure)', () => {
    fc.assert(
      fc.property(readings, fc.array(fc.tuple(fc.integer({ min: -600, max: 30_000 }), fc.integer({ min: 1, max: 20_000 })), { minLength: 1, maxLength: 12 }), (rs, spans) => {
        const windows = spans.map(([start, length]) => ({ from: T0 + start * MINUTE, to: T0 + (start + length) * MINUTE }));
        const got = exposuresOverWindows(toSeries(rs), windows, OPTIONS);
        windows.forEach((w, i) => expectClose(got[i], computeExposure(rs, { ...OPTIONS, ...w })));
      }),
      { numRuns: 150 },
    );
  });

  it('gives a window without readings as all missing time', () => {
    const [only] = exposuresOverWindows(toSeries([]), [{ from: T0, to: T0 + 90 * MINUTE }], OPTIONS);
    expect(only.hoursMissing).toBe(1.5);
    expect(only.hoursCovered).toBe(0);
    expect(only.minC).toBeNull();
  });

  it('refuses an empty window', () => {
    expect(() => exposuresOverWindows(toSeries([]), [{ from: T0, to: T0 }], OPTIONS)).toThrow(/empty/);
  });
});
