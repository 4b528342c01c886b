// Least-squares trend, checked against sums worked by hand (x̄, ȳ, Sxy/Sxx) and an exact line.
import { describe, expect, it } from 'vitest';
import { linearTrend, timeToReach } from '../../../shared/exposure';

const HOUR = 3_600_000;
const T0 = Date.UTC(2026, 0, 20, 22);
const at = (hours: number, c: number) => ({ t: T0 + hours * HOUR, c });

describe('linearTrend', () => {
  it('fits (0,0), (1,1), (2,1), (3,2): x̄ 1.5, ȳ 1, Sxy 3, Sxx 5 → slope 0.6, value 0.1 at x = 0', () => {
    const trend = linearTrend([at(0, 0), at(1, 1), at(2, 1), at(3, 2)]);
    expect(trend?.slopeCPerHour).toBeCloseTo(0.6, 12);
    expect(trend?.interceptAt(T0)).toBeCloseTo(0.1, 12);
    expect(trend?.interceptAt(T0 + 10 * HOUR)).toBeCloseTo(6.1, 12);
  });

  it('recovers an exact falling line at epoch-sized instants without losing digits', () => {
    const readings = Array.from({ length: 200 }, (_, i) => at(i / 12, 3 - 0.25 * (i / 12)));
    const trend = linearTrend(readings);
    expect(trend?.slopeCPerHour).toBeCloseTo(-0.25, 10);
    expect(trend?.interceptAt(T0 + 4 * HOUR)).toBeCloseTo(2, 10);
  });

  it('is null with fewer than two distinct instants', () => {
    expect(linearTrend([])).toBeNull();
    expect(linearTrend([at(0, 1)])).toBeNull();
    expect(linearTrend([at(1, 1), at(1, 3)])).toBeNull();
  });
});

describe('timeToReach', () => {
  const falling = linearTrend([at(0, 4), at(1, 3.5), at(2, 3)])!;

  it('a line falling 0.5 °C/h from 3 °C reaches −2 °C 10 h later', () => {
    expect(timeToReach(-2, falling, T0 + 2 * HOUR)).toBeCloseTo(T0 + 12 * HOUR, 3);
  });

  it('null when the line moves away from the limit', () => {
    expect(timeToReach(7, falling, T0 + 2 * HOUR)).toBeNull();
  });

  it('null for a flat line off the limit; fromT for a flat line on it', () => {
    const flat = linearTrend([at(0, 2), at(1, 2)])!;
    expect(timeToReach(0, flat, T0)).toBeNull();
    expect(timeToReach(2, flat, T0 + HOUR)).toBe(T0 + HOUR);
  });
});
