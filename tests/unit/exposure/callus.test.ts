// Callus thermal time: the rate curve, its exact integral along the joined line, and the full-callus estimate.
// Expected values are worked by hand from the curve's definition (areas of triangles and trapezoids).
import { describe, expect, it } from 'vitest';
import { callusRate, computeExposure, createCallusIntegrator, estimateFullCallus, type CallusModel } from '../../../shared/exposure';

const HOUR = 3_600_000;
const T0 = Date.UTC(2026, 2, 1);
/** Round numbers so that each piece's area is easy to work out by hand. */
const CURVE: CallusModel = { baseC: 0, optLowC: 10, optHighC: 20, upperC: 30, hoursAtOptimum: 40 };
const integrator = createCallusIntegrator(CURVE);

describe('callusRate', () => {
  it.each([
    [-5, 0],
    [0, 0],
    [2.5, 0.25],
    [10, 1],
    [15, 1],
    [20, 1],
    [25, 0.5],
    [30, 0],
    [45, 0],
  ])('at %s °C the rate is %s', (c, rate) => {
    expect(callusRate(CURVE, c)).toBe(rate);
  });

  it('peaks at one point when the optimum is a single temperature', () => {
    const peaked = { baseC: 15, optLowC: 20, optHighC: 20, upperC: 30 };
    expect([callusRate(peaked, 17.5), callusRate(peaked, 20), callusRate(peaked, 25)]).toEqual([0.5, 1, 0.5]);
  });
});

describe('exact integral along a straight piece', () => {
  it.each([
    // [from °C, to °C, hours, rate-hours worked by hand]
    [0, 30, 30, 5 + 10 + 5], // ramp triangle 10 h × ½, optimum 10 h, falling triangle 10 h × ½
    [30, 0, 30, 20], // the same piece walked downwards
    [-10, 40, 50, 20], // the 10 h at each end lie outside the curve
    [5, 15, 10, 3.75 + 5], // 5 h rising from 0.5 to 1, then 5 h at 1
    [25, 25, 10, 5], // constant at rate 0.5
    [12, 18, 6, 6], // wholly in the optimum
    [-3, -1, 4, 0], // wholly below base
    [2, 8, 3, 1.5], // inside the ramp: mean rate 0.5
  ])('%s → %s °C over %s h is worth %s h at optimum', (c0, c1, h, expected) => {
    expect(integrator.integratePiece(c0, c1, h)).toBeCloseTo(expected, 12);
  });

  it('the accumulator integrates over covered time only and reports progress against hoursAtOptimum', () => {
    const readings = [
      { t: T0, c: 0 },
      { t: T0 + 30 * HOUR, c: 30 },
      { t: T0 + 61 * HOUR, c: 15 }, // 31 h gap: more than maxGap, so not counted
      { t: T0 + 63 * HOUR, c: 15 },
    ];
    const e = computeExposure(readings, { band: { minC: 0, maxC: 30 }, freezeC: -2, maxGapMinutes: 30 * 60, callus: CURVE });
    expect(e.callus?.optimumEquivalentHours).toBeCloseTo(20 + 2, 12);
    expect(e.callus?.hoursAtOptimum).toBe(40);
    expect(e.callus?.progressPct).toBeCloseTo(55, 10);
  });

  it('progress may pass 100 %', () => {
    const e = computeExposure(
      [
        { t: T0, c: 15 },
        { t: T0 + 60 * HOUR, c: 15 },
      ],
      { band: { minC: 0, maxC: 30 }, freezeC: -2, maxGapMinutes: 60 * 60, callus: CURVE },
    );
    expect(e.callus?.progressPct).toBeCloseTo(150, 10);
  });
});

describe('estimateFullCallus', () => {
  const now = T0 + 100 * HOUR;

  it('at an optimum mean, the rest of hoursAtOptimum from now', () => {
    expect(estimateFullCallus({ progressPct: 25, hoursAtOptimum: 40, meanLast72hC: 15, model: CURVE, now })).toBe(now + 30 * HOUR);
  });

  it('at a half-rate mean, twice as long', () => {
    expect(estimateFullCallus({ progressPct: 25, hoursAtOptimum: 40, meanLast72hC: 25, model: CURVE, now })).toBe(now + 60 * HOUR);
  });

  it('apple at 4 °C in cold storage (rate 4/13): 50 % of 336 h takes 546 h', () => {
    const apple = { baseC: 0, optLowC: 13, optHighC: 18, upperC: 32 };
    const estimate = estimateFullCallus({ progressPct: 50, hoursAtOptimum: 336, meanLast72hC: 4, model: apple, now });
    expect(estimate! - now).toBeCloseTo(546 * HOUR, 3);
  });

  it('null when the rate at that mean is 0', () => {
    expect(estimateFullCallus({ progressPct: 10, hoursAtOptimum: 40, meanLast72hC: -1, model: CURVE, now })).toBeNull();
    expect(estimateFullCallus({ progressPct: 10, hoursAtOptimum: 40, meanLast72hC: 30, model: CURVE, now })).toBeNull();
  });

  it('now when already complete, whatever the temperature', () => {
    expect(estimateFullCallus({ progressPct: 100, hoursAtOptimum: 40, meanLast72hC: -5, model: CURVE, now })).toBe(now);
    expect(estimateFullCallus({ progressPct: 130, hoursAtOptimum: 40, meanLast72hC: 15, model: CURVE, now })).toBe(now);
  });
});
