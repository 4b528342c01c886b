// Degree-days by the triangle methods, reproduced from the engine's exact degree-hours: the day's minimum at 0 h,
// maximum at 12 h and the next minimum at 24 h, joined by straight lines, give exactly the single triangle (same
// minimum both ends) and the double triangle (next day's minimum) of REFERENCES §4b, horizontal cutoff:
// DD = (degree-hours above TL − degree-hours above TU) / 24.
import { describe, expect, it } from 'vitest';
import { computeExposure } from '../../../shared/exposure';
import { celsiusIntervalToFahrenheit, fahrenheitToCelsius } from '../../../shared/units';

const HOUR = 3_600_000;

function degreeHoursAbove(limit: number, min: number, max: number, nextMin: number): number {
  const day = [
    { t: 0, c: min },
    { t: 12 * HOUR, c: max },
    { t: 24 * HOUR, c: nextMin },
  ];
  // A band collapsed onto the limit makes `above` the degree-hours above it; the 12 h spacing must be joined.
  const exposure = computeExposure(day, { band: { minC: limit, maxC: limit }, freezeC: limit - 100, maxGapMinutes: 12 * 60 });
  return exposure.above.degreeHours;
}

/** Horizontal-cutoff triangle degree-days, in the unit the temperatures are given in. */
function triangleDegreeDays(min: number, max: number, nextMin: number, lower: number, upper: number): number {
  return (degreeHoursAbove(lower, min, max, nextMin) - degreeHoursAbove(upper, min, max, nextMin)) / 24;
}

describe('Zalom et al. 1983 Table 7 (REFERENCES §4c; °F, TL 55, TU 90, horizontal cutoff) [PUB]', () => {
  // [case, Tmin, Tmax, next-day Tmin, single triangle, double triangle]
  const rows: [number, number, number, number, number, number][] = [
    [1, 96, 110, 91, 35, 35],
    [1, 91, 105, 96, 35, 35],
    [2, 45, 54, 38, 0, 0],
    [2, 38, 50, 45, 0, 0],
    [3, 60, 80, 75, 15, 18.75],
    [3, 75, 88, 60, 26.5, 22.75],
    [4, 50, 82, 45, 11.39, 10.62],
    [4, 45, 70, 50, 4.5, 5.06],
    // Table 7 prints 24.88 for this double triangle; the degday author excludes it as a "suspected error in the
    // table" and the §4b formulas give 27.12 (REFERENCES §4c footnote), so the formula value is asserted.
    [5, 60, 100, 75, 23.75, 27.12],
    [5, 75, 95, 60, 29.38, 25.76],
    [6, 50, 101, 48, 19.56, 19.19],
    [6, 48, 95, 50, 16.76, 17.13],
  ];

  it.each(rows)('case %s: min %s, max %s, next min %s → single %s, double %s °F·d', (_case, min, max, next, single, double) => {
    expect(triangleDegreeDays(min, max, min, 55, 90)).toBeCloseTo(single, 2);
    expect(triangleDegreeDays(min, max, next, 55, 90)).toBeCloseTo(double, 2);
  });
});

describe('UC IPM calculator output, Esparto.A 2020 (REFERENCES §4d; °F, TL 50, TU 70) [PUB]', () => {
  // [date, Tmin, Tmax, next Tmin, sng tri, dbl tri]
  const rows: [string, number, number, number, number, number][] = [
    ['1/1/2020', 38, 55, 36, 0.74, 0.7],
    ['1/8/2020', 41, 50, 37, 0, 0],
    ['1/26/2020', 54, 67, 50, 10.5, 9.5],
    ['2/10/2020', 52, 73, 44, 12.29, 10.63],
    ['2/11/2020', 44, 76, 35, 10.0, 8.9],
    ['8/14/2020', 71, 103, 68, 20, 19.97],
  ];

  it.each(rows)('%s: min %s, max %s, next min %s → sng tri %s, dbl tri %s °F·d', (_date, min, max, next, single, double) => {
    expect(triangleDegreeDays(min, max, min, 50, 70)).toBeCloseTo(single, 2);
    expect(triangleDegreeDays(min, max, next, 50, 70)).toBeCloseTo(double, 2);
  });
});

describe('Celsius examples for the callus context (REFERENCES §4f; TL 7 °C, TU 32 °C) [CALC]', () => {
  const rows: [number, number, number][] = [
    [4, 16, 3.375],
    [2, 10, 0.5625],
    [8, 14, 4.0],
    [-2, 12, 0.8929],
    [20, 36, 20.5],
  ];

  it.each(rows)('min %s °C, max %s °C → single triangle %s °C·d', (min, max, single) => {
    expect(triangleDegreeDays(min, max, min, 7, 32)).toBeCloseTo(single, 4);
  });
});

describe('unit invariance (REFERENCES §4b [CALC]; NIST SP 811 interval 1 °F = 5/9 °C [PUB])', () => {
  it('case-6 row 50/101 °F, TL 55, TU 90: 19.5588 °F·d fed as °F equals 10.8660 °C·d × 9/5 fed as °C', () => {
    const inFahrenheit = triangleDegreeDays(50, 101, 50, 55, 90);
    const [min, max, lower, upper] = [50, 101, 55, 90].map(fahrenheitToCelsius);
    const inCelsius = triangleDegreeDays(min, max, min, lower, upper);
    expect(inFahrenheit).toBeCloseTo(19.5588, 4);
    expect(inCelsius).toBeCloseTo(10.866, 4);
    expect(celsiusIntervalToFahrenheit(inCelsius)).toBeCloseTo(inFahrenheit, 10);
  });
});
