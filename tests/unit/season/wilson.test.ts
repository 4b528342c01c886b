import fc from 'fast-check';
import jstat from 'jstat';
import { describe, expect, it } from 'vitest';
import { wilsonInterval, Z_95 } from '../../../shared/season/wilson';

const { jStat } = jstat;

/** Two-sided p-value of the score test of H0: proportion = p, with jStat's normal distribution. */
function scoreTestP(successes: number, trials: number, p: number): number {
  const statistic = (successes / trials - p) / Math.sqrt((p * (1 - p)) / trials);
  return 2 * (1 - jStat.normal.cdf(Math.abs(statistic), 0, 1));
}

describe('wilsonInterval', () => {
  it('uses z = Φ⁻¹(0.975) as jStat computes it', () => {
    expect(Z_95).toBeCloseTo(jStat.normal.inv(0.975, 0, 1), 12);
  });

  // Newcombe, R.G. 1998, Stat. Med. 17:857–872, Table I, method 3 (score interval without continuity
  // correction), printed to 4 decimals. The numbers are from memory; the score-test checks below stand
  // independently of them.
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])('matches Newcombe 1998 Table I for %i of %i (from memory)', (x, n, low, high) => {
    const interval = wilsonInterval(x, n)!;
    expect(interval.low).toBeCloseTo(low, 4);
    expect(interval.high).toBeCloseTo(high, 4);
  });

  // Wilson 1927 defines the interval as the proportions a two-sided score test at 5 % does not reject, so at
  // each bound strictly inside (0, 1) jStat's normal distribution must give a p-value of exactly 0.05.
  it('puts each inner bound where the score test, by jStat, has p = 0.05', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n))), ([x, n]) => {
        const { low, high } = wilsonInterval(x, n)!;
        if (x > 0) expect(scoreTestP(x, n, low)).toBeCloseTo(0.05, 9);
        if (x < n) expect(scoreTestP(x, n, high)).toBeCloseTo(0.05, 9);
      }),
      { numRuns: 300 },
    );
  });

  it('contains exactly the proportions the score test does not reject (grid of 999 values)', () => {
    for (const [x, n] of [[3, 7], [18, 20], [0, 5], [40, 41], [212, 230]]) {
      const { low, high } = wilsonInterval(x, n)!;
      for (let i = 1; i < 1000; i++) {
        const p = i / 1000;
        // Skip grid points within 1e-9 of a bound, where rounding decides either way.
        if (Math.abs(p - low) < 1e-9 || Math.abs(p - high) < 1e-9) continue;
        expect(p >= low && p <= high, `${x}/${n} at p=${p}`).toBe(scoreTestP(x, n, p) >= 0.05);
      }
    }
  });

  it('is exactly 0 below none taken and 1 above all taken', () => {
    expect(wilsonInterval(0, 12)!.low).toBe(0);
    expect(wilsonInterval(12, 12)!.high).toBe(1);
  });

  it('mirrors: the interval for n − x is one minus the interval for x', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n))), ([x, n]) => {
        const a = wilsonInterval(x, n)!;
        const b = wilsonInterval(n - x, n)!;
        expect(a.low).toBeCloseTo(1 - b.high, 12);
        expect(a.high).toBeCloseTo(1 - b.low, 12);
        expect(a.low).toBeLessThanOrEqual(x / n);
        expect(a.high).toBeGreaterThanOrEqual(x / n);
      }),
      { numRuns: 200 },
    );
  });

  it('has no interval without trials, and refuses impossible counts', () => {
    expect(wilsonInterval(0, 0)).toBeNull();
    expect(() => wilsonInterval(5, 4)).toThrow(/0 ≤ successes ≤ trials/);
    expect(() => wilsonInterval(-1, 4)).toThrow();
    expect(() => wilsonInterval(1.5, 4)).toThrow();
    expect(() => wilsonInterval(1, 4, 0)).toThrow(/z must be/);
  });
});
