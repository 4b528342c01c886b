import fc from 'fast-check';
import jstat from 'jstat';
import { describe, expect, it } from 'vitest';
import { freezeBand, quartileCuts, quartileOf } from '../../../shared/season/exposureBands';

const { jStat } = jstat;

describe('freezeBand', () => {
  it.each([
    [0, 'none'],
    [1e-9, 'under-1'],
    [0.999, 'under-1'],
    [1, '1-6'],
    [6, '1-6'],
    [6.0001, 'over-6'],
    [400, 'over-6'],
  ] as const)('puts %f freeze hours in %s', (hours, band) => {
    expect(freezeBand(hours)).toBe(band);
  });

  it('refuses negative or missing hours', () => {
    expect(() => freezeBand(-0.5)).toThrow();
    expect(() => freezeBand(Number.NaN)).toThrow();
  });
});

describe('quartileCuts', () => {
  // Hand-computed, type 7 (Hyndman & Fan 1996): positions (n − 1)·p over the sorted values.
  it('interpolates between order statistics: 1,2,3,4 → 1.75, 2.5, 3.25', () => {
    expect(quartileCuts([4, 1, 3, 2])).toEqual([1.75, 2.5, 3.25]);
  });

  it('gives the value itself for one batch and nothing for none', () => {
    expect(quartileCuts([12.5])).toEqual([12.5, 12.5, 12.5]);
    expect(quartileCuts([])).toBeNull();
  });

  // jStat.quantiles follows scipy's mquantiles; with alphap = betap = 1 it is the type 7 definition.
  it('agrees with jStat.quantiles(values, p, 1, 1)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 5000, noNaN: true }), { minLength: 2, maxLength: 60 }), (values) => {
        const expected = jStat.quantiles(values, [0.25, 0.5, 0.75], 1, 1);
        quartileCuts(values)!.forEach((cut, i) => expect(cut).toBeCloseTo(expected[i], 9));
      }),
      { numRuns: 200 },
    );
  });
});

describe('quartileOf', () => {
  it('keeps values on a cut point in the lower quarter', () => {
    const cuts: [number, number, number] = [0, 0, 20];
    expect([0, 0.1, 20, 20.5].map((v) => quartileOf(v, cuts))).toEqual(['q1', 'q3', 'q3', 'q4']);
  });
});
