// Summing placements and taking the worst of several loggers in one room.
import { describe, expect, it } from 'vitest';
import { computeExposure, sumExposures, worstOf, type ExposureOptions } from '../../../shared/exposure';

const HOUR = 3_600_000;
const T0 = Date.UTC(2026, 0, 5);
const at = (hours: number, c: number) => ({ t: T0 + hours * HOUR, c });
const CALLUS = { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32, hoursAtOptimum: 336 };
const OPTS: ExposureOptions = { band: { minC: 0, maxC: 7 }, freezeC: -2, callus: CALLUS };

describe('sumExposures', () => {
  it('keeps meanC exact through the summed integral: 1 h at 1 °C and 3 h at 5 °C average 4 °C', () => {
    const a = computeExposure([at(0, 1), at(1, 1)], OPTS);
    const b = computeExposure([at(10, 5), at(13, 5)], OPTS);
    const sum = sumExposures([a, b]);
    expect(sum.meanC).toBe(4);
    expect(sum.hoursCovered).toBe(4);
    expect([sum.minC, sum.maxC]).toEqual([1, 5]);
    expect(sum.callus?.optimumEquivalentHours).toBeCloseTo(1 / 13 + (3 * 5) / 13, 12);
    expect(sum.callus?.progressPct).toBeCloseTo((100 * (16 / 13)) / 336, 12);
  });

  it('adds hours and degree-hours of each limit', () => {
    const a = computeExposure([at(0, -4), at(1, -4)], OPTS);
    const b = computeExposure([at(5, 9), at(7, 9)], OPTS);
    const sum = sumExposures([a, b, a]);
    expect(sum.freeze).toEqual({ limitC: -2, hours: 2, degreeHours: 4 });
    expect(sum.below).toEqual({ limitC: 0, hours: 2, degreeHours: 8 });
    expect(sum.above).toEqual({ limitC: 7, hours: 2, degreeHours: 4 });
  });

  it('ignores pieces without readings for min/max and mean', () => {
    const empty = computeExposure([], OPTS);
    const some = computeExposure([at(0, 3), at(1, 3)], OPTS);
    const sum = sumExposures([empty, some]);
    expect([sum.minC, sum.maxC, sum.meanC]).toEqual([3, 3, 3]);
    expect(sumExposures([empty, empty]).meanC).toBeNull();
  });
});

describe('worstOf: several loggers in one room at once', () => {
  // A cold corner by the door, a warm spot under the lights, and a logger that missed half the time.
  const coldCorner = computeExposure([at(0, 1), at(1, -4), at(2, 1)], OPTS);
  const warmSpot = computeExposure([at(0, 6), at(1, 11), at(2, 6)], OPTS);
  const patchy = computeExposure([at(0, 3), at(1, 3)], OPTS);
  const worst = worstOf([patchy, coldCorner, warmSpot]);

  it('takes each risk figure from whichever logger is worst for it', () => {
    expect(worst.freeze).toEqual(coldCorner.freeze);
    expect(worst.below).toEqual(coldCorner.below);
    expect(worst.above).toEqual(warmSpot.above);
    expect(worst.minC).toBe(-4);
    expect(worst.maxC).toBe(11);
  });

  it('takes covered/missing hours and mean together from the best-observed logger (first on a tie)', () => {
    expect([worst.hoursCovered, worst.hoursMissing, worst.meanC, worst.integralCH]).toEqual([
      coldCorner.hoursCovered,
      coldCorner.hoursMissing,
      coldCorner.meanC,
      coldCorner.integralCH,
    ]);
  });

  it('takes the least advanced callus, since the batch is ready only when its slowest corner is', () => {
    const slowest = Math.min(...[patchy, coldCorner, warmSpot].map((e) => e.callus!.optimumEquivalentHours));
    expect(worst.callus?.optimumEquivalentHours).toBe(slowest);
    expect(slowest).toBe(coldCorner.callus?.optimumEquivalentHours);
  });

  it('a worst-of headline can itself be summed over placements', () => {
    expect(sumExposures([worst, worst]).meanC).toBeCloseTo(coldCorner.meanC!, 12);
  });
});

describe('combining exposures that do not belong together', () => {
  const a = computeExposure([at(0, 1), at(1, 1)], OPTS);

  it.each([
    ['different band', computeExposure([at(0, 1), at(1, 1)], { ...OPTS, band: { minC: 1, maxC: 7 } }), /below limits differ/],
    ['different freeze limit', computeExposure([at(0, 1), at(1, 1)], { ...OPTS, freezeC: -3 }), /freeze limits differ/],
    ['no callus model', computeExposure([at(0, 1), at(1, 1)], { ...OPTS, callus: undefined }), /callus progress/],
    ['different callus model', computeExposure([at(0, 1), at(1, 1)], { ...OPTS, callus: { ...CALLUS, hoursAtOptimum: 100 } }), /callus models differ/],
  ])('rejects a %s', (_what, other, message) => {
    expect(() => sumExposures([a, other])).toThrow(message);
    expect(() => worstOf([a, other])).toThrow(message);
  });

  it('rejects an empty list', () => {
    expect(() => sumExposures([])).toThrow(/at least one/);
    expect(() => worstOf([])).toThrow(/at least one/);
  });
});
