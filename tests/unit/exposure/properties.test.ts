// Properties of the exposure definition (fast-check), and agreement with an independent implementation:
// a dense 1-second sampling of the joined line written here from the definition, sharing no code with the engine.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeExposure, sumExposures, type Exposure, type ExposureOptions, type Reading } from '../../../shared/exposure';

const SECOND = 1000;
const MINUTE = 60 * SECOND;
const HOUR = 60 * MINUTE;
const T0 = Date.UTC(2026, 1, 2);
const CALLUS = { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32, hoursAtOptimum: 336 };
const OPTS: ExposureOptions = { band: { minC: 0, maxC: 7 }, freezeC: -2, callus: CALLUS };

/**
 * Readings a whole number of seconds apart, up to 4 h (so some pairs are past the 180 min gap), −12…35 °C at a
 * logger's 0.01 °C resolution. (With arbitrary doubles, subnormal values let a point "on the line" round onto
 * a limit, and "strictly below" is discontinuous there — a floating-point artefact, not a property of the data.)
 */
const series = (maxLength: number, minC = -12, maxC = 35) =>
  fc
    .array(fc.record({ gapS: fc.integer({ min: 0, max: 4 * 3600 }), c: fc.integer({ min: minC * 100, max: maxC * 100 }).map((k) => k / 100) }), {
      minLength: 1,
      maxLength,
    })
    .map((steps) => {
      let t = T0;
      return steps.map(({ gapS, c }): Reading => ({ t: (t += gapS * SECOND), c }));
    });

/** The figures that must add up, as one list. */
function additive(e: Exposure): number[] {
  return [
    e.hoursCovered,
    e.hoursMissing,
    e.integralCH,
    e.below.hours,
    e.below.degreeHours,
    e.above.hours,
    e.above.degreeHours,
    e.freeze.hours,
    e.freeze.degreeHours,
    e.callus?.optimumEquivalentHours ?? 0,
  ];
}

function expectRelativelyClose(actual: number[], expected: number[], relative = 1e-9): void {
  actual.forEach((a, i) => {
    const b = expected[i];
    expect(Math.abs(a - b)).toBeLessThanOrEqual(relative * Math.max(1, Math.abs(a), Math.abs(b)));
  });
}

describe('exposure properties', () => {
  it('splitting a series at any instant and summing the parts gives the same totals', () => {
    fc.assert(
      fc.property(series(30), fc.double({ min: 0, max: 1, noNaN: true }), (readings, where) => {
        const first = readings[0].t;
        const last = readings[readings.length - 1].t;
        const cut = first + Math.round(where * (last - first));
        const whole = computeExposure(readings, OPTS);
        const parts = sumExposures([computeExposure(readings, { ...OPTS, to: cut }), computeExposure(readings, { ...OPTS, from: cut })]);
        expectRelativelyClose(additive(parts), additive(whole));
        expect([parts.minC, parts.maxC]).toEqual([whole.minC, whole.maxC]);
        if (whole.meanC !== null) expect(parts.meanC).toBeCloseTo(whole.meanC, 9);
      }),
      { numRuns: 300 },
    );
  });

  it('a series wholly inside the band has zero below/above exposure', () => {
    fc.assert(
      fc.property(series(30, 0, 7), (readings) => {
        const e = computeExposure(readings, OPTS);
        expect([e.below.hours, e.below.degreeHours, e.above.hours, e.above.degreeHours]).toEqual([0, 0, 0, 0]);
      }),
    );
  });

  it('adding readings that lie exactly on the joined line changes nothing', () => {
    fc.assert(
      fc.property(series(20), fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 10 }), (readings, places) => {
        const maxGapMs = 180 * MINUTE;
        const denser: Reading[] = [];
        readings.forEach((a, i) => {
          denser.push(a);
          const b = readings[i + 1];
          // Only inside joined segments (a point in a gap would join it), inserted in place so that equal
          // instants keep their order.
          if (!b || b.t - a.t > maxGapMs) return;
          const fractions = places.filter((_, k) => k % (readings.length - 1) === i).sort((x, y) => x - y);
          for (const f of fractions) denser.push({ t: a.t + f * (b.t - a.t), c: a.c + f * (b.c - a.c) });
        });
        const before = computeExposure(readings, OPTS);
        const after = computeExposure(denser, OPTS);
        expectRelativelyClose(additive(after), additive(before));
        // The inserted values are on the line up to rounding of a + f·(b − a).
        expectRelativelyClose([after.minC!, after.maxC!], [before.minC!, before.maxC!]);
      }),
    );
  });

  it('raising every temperature by d > 0 never increases degree-hours below, never decreases degree-hours above', () => {
    fc.assert(
      fc.property(series(30), fc.double({ min: 1e-6, max: 20, noNaN: true }), (readings, d) => {
        const before = computeExposure(readings, OPTS);
        const after = computeExposure(
          readings.map((r) => ({ t: r.t, c: r.c + d })),
          OPTS,
        );
        const slack = (x: number) => 1e-9 * Math.max(1, x);
        expect(after.below.degreeHours).toBeLessThanOrEqual(before.below.degreeHours + slack(before.below.degreeHours));
        expect(after.freeze.degreeHours).toBeLessThanOrEqual(before.freeze.degreeHours + slack(before.freeze.degreeHours));
        expect(after.above.degreeHours).toBeGreaterThanOrEqual(before.above.degreeHours - slack(before.above.degreeHours));
      }),
    );
  });
});

// ---- independent reference: sample the joined line at the middle of every second ----

interface DenseFigures {
  covered: number;
  missing: number;
  mean: number | null;
  below: [number, number];
  above: [number, number];
  freeze: [number, number];
  callus: number;
}

function referenceRate(c: number): number {
  const { baseC, optLowC, optHighC, upperC } = CALLUS;
  return Math.max(0, Math.min((c - baseC) / (optLowC - baseC), 1, (upperC - c) / (upperC - optHighC)));
}

function denseReference(readings: Reading[], opts: ExposureOptions): DenseFigures {
  const maxGapMs = (opts.maxGapMinutes ?? 180) * MINUTE;
  const start = opts.from ?? readings[0].t;
  const end = opts.to ?? readings[readings.length - 1].t;
  const step = SECOND / HOUR;
  const figures: DenseFigures = { covered: 0, missing: 0, mean: null, below: [0, 0], above: [0, 0], freeze: [0, 0], callus: 0 };
  let integral = 0;
  let j = 0;
  for (let s = start; s < end; s += SECOND) {
    const mid = s + SECOND / 2;
    while (j < readings.length - 1 && readings[j + 1].t <= mid) j++;
    const a = readings[j];
    const b = readings[j + 1];
    if (!b || a.t > mid || b.t - a.t > maxGapMs) {
      figures.missing += step;
      continue;
    }
    const c = a.c + ((b.c - a.c) * (mid - a.t)) / (b.t - a.t);
    figures.covered += step;
    integral += c * step;
    if (c < opts.band.minC) figures.below = [figures.below[0] + step, figures.below[1] + (opts.band.minC - c) * step];
    if (c > opts.band.maxC) figures.above = [figures.above[0] + step, figures.above[1] + (c - opts.band.maxC) * step];
    if (c < opts.freezeC) figures.freeze = [figures.freeze[0] + step, figures.freeze[1] + (opts.freezeC - c) * step];
    figures.callus += referenceRate(c) * step;
  }
  figures.mean = figures.covered > 0 ? integral / figures.covered : null;
  return figures;
}

describe('agreement with an independent dense-sampling implementation (1 s steps)', () => {
  const window = fc.option(
    fc.tuple(fc.integer({ min: -3600, max: 30 * 3600 }), fc.integer({ min: 0, max: 30 * 3600 })).map(([startS, lengthS]) => ({
      from: T0 + startS * SECOND,
      to: T0 + (startS + lengthS) * SECOND,
    })),
    { nil: undefined },
  );

  it('within 0.01 h and 0.01 °C·h on random series, with and without a clip window', () => {
    fc.assert(
      fc.property(series(10), window, fc.integer({ min: -5, max: 10 }), (readings, clip, bandLow) => {
        const opts: ExposureOptions = { ...OPTS, band: { minC: bandLow, maxC: bandLow + 6 }, ...clip };
        const engine = computeExposure(readings, opts);
        const ref = denseReference(readings, opts);
        const close = (a: number, b: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(0.01);
        close(engine.hoursCovered, ref.covered);
        close(engine.hoursMissing, ref.missing);
        close(engine.below.hours, ref.below[0]);
        close(engine.below.degreeHours, ref.below[1]);
        close(engine.above.hours, ref.above[0]);
        close(engine.above.degreeHours, ref.above[1]);
        close(engine.freeze.hours, ref.freeze[0]);
        close(engine.freeze.degreeHours, ref.freeze[1]);
        close(engine.callus?.optimumEquivalentHours ?? Number.NaN, ref.callus);
        if (ref.mean === null || engine.meanC === null) expect(engine.hoursCovered).toBeLessThan(0.01);
        else close(engine.meanC, ref.mean);
      }),
      { numRuns: 60 },
    );
  });
});
