import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countOf, packReadings, pickReadings, unpackReadings } from '../../../server/imports/packedReadings';

describe('packed readings (the reader thread’s batches)', () => {
  it('unpack(pack(x)) gives x back, humidity absent or present', () => {
    const reading = fc.record({
      t: fc.integer({ min: 0, max: Date.UTC(2100, 0, 1) }),
      c: fc.double({ noNaN: true }),
      rh: fc.option(fc.double({ min: 0, max: 100, noNaN: true }), { nil: null }),
      line: fc.integer({ min: 1, max: 2 ** 32 - 1 }),
    });
    fc.assert(
      fc.property(fc.array(reading, { maxLength: 100 }), (readings) => {
        expect(unpackReadings(packReadings(readings))).toEqual(readings);
      }),
    );
  });

  it('picks readings by index, in the order asked', () => {
    const readings = [1, 2, 3, 4].map((k) => ({ t: k * 1000, c: k / 10, rh: k % 2 ? null : k, line: k + 1 }));
    expect(unpackReadings(pickReadings(packReadings(readings), [3, 0]))).toEqual([readings[3], readings[0]]);
    expect(countOf(pickReadings(packReadings(readings), []))).toBe(0);
  });
});
