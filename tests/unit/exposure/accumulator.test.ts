// Hand-computed cases for the joined-line definition: gaps, clipping at placement ends, edge cases, errors.
import { describe, expect, it } from 'vitest';
import { computeExposure, createExposureAccumulator, toExposureReport, type ExposureOptions } from '../../../shared/exposure';

const HOUR = 3_600_000;
const MINUTE = 60_000;
const T0 = Date.UTC(2026, 0, 12, 6); // an arbitrary winter morning: epoch-sized numbers, as the server sends
const at = (hours: number, c: number) => ({ t: T0 + hours * HOUR, c });
const OPTS: ExposureOptions = { band: { minC: 1, maxC: 3 }, freezeC: -2 };

describe('computeExposure on hand-computed series', () => {
  it('no readings: zero hours and null temperatures', () => {
    const e = computeExposure([], OPTS);
    expect(toExposureReport(e)).toEqual({
      hoursCovered: 0,
      hoursMissing: 0,
      minC: null,
      maxC: null,
      meanC: null,
      below: { limitC: 1, hours: 0, degreeHours: 0 },
      above: { limitC: 3, hours: 0, degreeHours: 0 },
      freeze: { limitC: -2, hours: 0, degreeHours: 0 },
    });
  });

  it('one reading: nothing covered, min and max are that reading, no mean', () => {
    const e = computeExposure([at(0, 5)], OPTS);
    expect([e.hoursCovered, e.hoursMissing, e.minC, e.maxC, e.meanC]).toEqual([0, 0, 5, 5, null]);
  });

  it('a ramp 0 → 4 °C over 1 h crosses both band limits exactly', () => {
    const e = computeExposure([at(0, 0), at(1, 4)], OPTS);
    expect(e.hoursCovered).toBe(1);
    expect(e.meanC).toBe(2);
    // Below 1 °C for the first quarter hour: triangle ½ · 0.25 h · 1 °C.
    expect(e.below.hours).toBeCloseTo(0.25, 12);
    expect(e.below.degreeHours).toBeCloseTo(0.125, 12);
    expect(e.above.hours).toBeCloseTo(0.25, 12);
    expect(e.above.degreeHours).toBeCloseTo(0.125, 12);
    expect(e.freeze.hours).toBe(0);
  });

  it('a dip to −4 °C and back over 2 h spends 1 h below −2 °C, 1 °C·h', () => {
    const e = computeExposure([at(0, 0), at(1, -4), at(2, 0)], OPTS);
    expect(e.freeze.hours).toBeCloseTo(1, 12);
    expect(e.freeze.degreeHours).toBeCloseTo(1, 12);
    expect(e.minC).toBe(-4);
    expect(e.meanC).toBe(-2);
  });

  it('"strictly below": a line lying exactly on a limit adds no time', () => {
    const e = computeExposure([at(0, -2), at(3, -2)], OPTS);
    expect(e.freeze.hours).toBe(0);
    expect(e.below.hours).toBe(3);
    expect(e.below.degreeHours).toBe(9);
  });

  it('equal instants are allowed and add no time', () => {
    const e = computeExposure([at(0, 2), at(0, 10), at(1, 2)], OPTS);
    expect(e.hoursCovered).toBe(1);
    expect(e.maxC).toBe(10);
    expect(e.meanC).toBe(6);
  });

  it('accepts any iterable, e.g. rows streamed by a generator', () => {
    function* rows() {
      for (let h = 0; h <= 10; h++) yield at(h, h % 2 === 0 ? 0 : 4);
    }
    const e = computeExposure(rows(), OPTS);
    expect(e.hoursCovered).toBe(10);
    expect(e.below.hours).toBeCloseTo(2.5, 12);
  });

  it('one million readings in one pass: a 0/2 °C zigzag each minute is below 1 °C half the time', () => {
    const accumulator = createExposureAccumulator({ band: { minC: 1, maxC: 1 }, freezeC: -2 });
    const n = 1_000_000;
    for (let i = 0; i < n; i++) accumulator.push(T0 + i * MINUTE, i % 2 === 0 ? 0 : 2);
    const e = accumulator.result();
    const hours = (n - 1) / 60;
    expect(e.hoursCovered).toBeCloseTo(hours, 9);
    expect(e.below.hours).toBeCloseTo(hours / 2, 6);
    // Each minute's triangle below 1 °C: ½ · ½ min · 1 °C.
    expect(e.below.degreeHours).toBeCloseTo(hours / 4, 6);
    expect(e.meanC).toBeCloseTo(1, 9);
  });
});

describe('gaps: readings more than maxGapMinutes apart are not joined', () => {
  it('a 4 h gap with the 180 min default is missing time', () => {
    const e = computeExposure([at(0, 0), at(1, 0), at(5, 0)], OPTS);
    expect(e.hoursCovered).toBe(1);
    expect(e.hoursMissing).toBe(4);
    expect(e.below.hours).toBe(1);
    expect(e.minC).toBe(0);
  });

  it('the limit is inclusive: exactly 180 min is joined, 1 ms more is not', () => {
    expect(computeExposure([at(0, 0), at(3, 0)], OPTS).hoursCovered).toBe(3);
    const apart = computeExposure([{ t: T0, c: 0 }, { t: T0 + 3 * HOUR + 1, c: 0 }], OPTS);
    expect(apart.hoursCovered).toBe(0);
    expect(apart.hoursMissing).toBeCloseTo(3, 6);
  });

  it('maxGapMinutes overrides the default', () => {
    const readings = [at(0, 0), at(0.5, 0), at(1.5, 0)];
    expect(computeExposure(readings, { ...OPTS, maxGapMinutes: 30 }).hoursCovered).toBe(0.5);
    expect(computeExposure(readings, { ...OPTS, maxGapMinutes: 60 }).hoursCovered).toBe(1.5);
  });

  it('the time across a gap counts for nothing, however cold its ends', () => {
    const e = computeExposure([at(0, -10), at(10, -10)], OPTS);
    expect(e.freeze.hours).toBe(0);
    expect(e.hoursMissing).toBe(10);
    expect(e.meanC).toBeNull();
  });
});

describe('clipping to a placement [from, to]', () => {
  const ramp = [at(0, 0), at(2, 4)];

  it('interpolates the joined line at both clip instants', () => {
    const e = computeExposure(ramp, { ...OPTS, from: T0 + 0.5 * HOUR, to: T0 + 1.5 * HOUR });
    expect(e.hoursCovered).toBe(1);
    expect(e.hoursMissing).toBe(0);
    expect(e.minC).toBe(1);
    expect(e.maxC).toBe(3);
    expect(e.meanC).toBe(2);
    expect(e.below.hours).toBe(0);
    expect(e.above.hours).toBe(0);
  });

  it('a window inside one joined segment, with no reading in it, still sees the line', () => {
    const e = computeExposure(ramp, { ...OPTS, from: T0 + 0.25 * HOUR, to: T0 + 0.75 * HOUR });
    expect(e.hoursCovered).toBe(0.5);
    expect(e.minC).toBe(0.5);
    expect(e.maxC).toBe(1.5);
    expect(e.below.hours).toBeCloseTo(0.25, 12);
    expect(e.below.degreeHours).toBeCloseTo(0.0625, 12);
  });

  it('does not interpolate across a gap: the placement time before the next reading is missing', () => {
    const readings = [at(0, 0), at(4, 8), at(5, 8)];
    const e = computeExposure(readings, { ...OPTS, from: T0 + 1 * HOUR, to: T0 + 5 * HOUR });
    expect(e.hoursCovered).toBe(1);
    expect(e.hoursMissing).toBe(3);
    expect(e.minC).toBe(8);
  });

  it('counts placement time before the first and after the last reading as missing', () => {
    const e = computeExposure([at(2, 2), at(3, 2)], { ...OPTS, from: T0, to: T0 + 6 * HOUR });
    expect(e.hoursCovered).toBe(1);
    expect(e.hoursMissing).toBe(5);
  });

  it('a placement with no readings at all is wholly missing', () => {
    const e = computeExposure([at(10, 2), at(11, 2)], { ...OPTS, from: T0, to: T0 + 6 * HOUR });
    expect([e.hoursCovered, e.hoursMissing, e.minC, e.maxC, e.meanC]).toEqual([0, 6, null, null, null]);
  });

  it('an open-ended window (from only, or to only) is bounded by the readings on the open side', () => {
    const readings = [at(0, 0), at(1, 2), at(2, 4)];
    const fromOnly = computeExposure(readings, { ...OPTS, from: T0 + 0.5 * HOUR });
    expect([fromOnly.hoursCovered, fromOnly.hoursMissing, fromOnly.minC]).toEqual([1.5, 0, 1]);
    const toOnly = computeExposure(readings, { ...OPTS, to: T0 + 0.5 * HOUR });
    expect([toOnly.hoursCovered, toOnly.hoursMissing, toOnly.maxC]).toEqual([0.5, 0, 1]);
  });

  it('the two halves of a placement split at any instant add up to the whole', () => {
    const readings = [at(0, -3), at(1, 5), at(2, 0), at(7, 1), at(8, 2)];
    const cut = T0 + 1.3 * HOUR;
    const whole = computeExposure(readings, OPTS);
    const first = computeExposure(readings, { ...OPTS, to: cut });
    const second = computeExposure(readings, { ...OPTS, from: cut });
    expect(first.hoursCovered + second.hoursCovered).toBeCloseTo(whole.hoursCovered, 12);
    expect(first.hoursMissing + second.hoursMissing).toBeCloseTo(whole.hoursMissing, 12);
    expect(first.freeze.degreeHours + second.freeze.degreeHours).toBeCloseTo(whole.freeze.degreeHours, 12);
    expect(first.above.degreeHours + second.above.degreeHours).toBeCloseTo(whole.above.degreeHours, 12);
  });
});

describe('toExposureReport', () => {
  it('has exactly the fields `coldknit check --json` prints, plus callus only when a model was given', () => {
    const plain = toExposureReport(computeExposure([at(0, 1), at(1, 2)], OPTS));
    expect(Object.keys(plain).sort()).toEqual(
      ['above', 'below', 'freeze', 'hoursCovered', 'hoursMissing', 'maxC', 'meanC', 'minC'].sort(),
    );
    const callus = { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32, hoursAtOptimum: 336 };
    const withCallus = toExposureReport(computeExposure([at(0, 1), at(1, 2)], { ...OPTS, callus }));
    expect(Object.keys(withCallus)).toContain('callus');
    expect(withCallus).not.toHaveProperty('integralCH');
  });
});

describe('input errors', () => {
  it('rejects readings out of time order', () => {
    const accumulator = createExposureAccumulator(OPTS);
    accumulator.push(T0 + HOUR, 1);
    expect(() => accumulator.push(T0, 1)).toThrow(/out of time order/);
  });

  it('rejects non-finite readings', () => {
    const accumulator = createExposureAccumulator(OPTS);
    expect(() => accumulator.push(T0, Number.NaN)).toThrow(/finite/);
    expect(() => accumulator.push(Number.POSITIVE_INFINITY, 1)).toThrow(/finite/);
  });

  it.each([
    [{ ...OPTS, band: { minC: 5, maxC: 1 } }, /band minimum 5 °C is above its maximum 1 °C/],
    [{ ...OPTS, freezeC: Number.NaN }, /freezeC/],
    [{ ...OPTS, maxGapMinutes: -1 }, /maxGapMinutes/],
    [{ ...OPTS, from: T0 + HOUR, to: T0 }, /starts .* after it ends/],
    [{ ...OPTS, callus: { baseC: 5, optLowC: 5, optHighC: 10, upperC: 20, hoursAtOptimum: 100 } }, /base 5 °C must be below/],
    [{ ...OPTS, callus: { baseC: 0, optLowC: 5, optHighC: 10, upperC: 20, hoursAtOptimum: 0 } }, /hoursAtOptimum/],
  ])('rejects bad options (%#)', (opts, message) => {
    expect(() => createExposureAccumulator(opts)).toThrow(message);
  });
});
