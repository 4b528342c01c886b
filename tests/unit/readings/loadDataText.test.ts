import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Reading } from '../../../shared/import/types';
import { packReadings } from '../../../server/imports/packedReadings';
import { loadDataRows } from '../../../server/readings/loadDataText';

// The references are ECMAScript's own formatters: Date.prototype.toISOString (ISO 8601, UTC) for the instant and
// Number.prototype.toFixed for the decimals, applied to the values rounded to the columns' precision as MariaDB keeps
// them (DECIMAL(7,4) for °C, DECIMAL(5,2) for humidity).
const reference = (readings: Reading[]) =>
  readings
    .map((r) => {
      const instant = new Date(r.t).toISOString().slice(0, 23).replace('T', ' ');
      const c = (Math.round(r.c * 10_000) / 10_000).toFixed(4);
      const rh = r.rh === null ? '\\N' : (Math.round(r.rh * 100) / 100).toFixed(2);
      return `${instant}\t${c}\t${rh}\n`;
    })
    .join('');

const reading = fc.record({
  t: fc.integer({ min: Date.UTC(1971, 0, 1), max: Date.UTC(2099, 11, 31) }),
  c: fc.double({ min: -50, max: 70, noNaN: true }),
  rh: fc.option(fc.double({ min: 0, max: 100, noNaN: true }), { nil: null }),
  line: fc.nat(),
});

describe('loadDataRows', () => {
  it('writes the same bytes as toISOString and toFixed at the columns’ precision', () => {
    fc.assert(
      fc.property(fc.array(reading, { maxLength: 50 }), (readings) => {
        expect(loadDataRows(packReadings(readings)).toString('ascii')).toBe(reference(readings));
      }),
      { numRuns: 2000 },
    );
  });

  it('handles the edges: the plausible limits, values that round to zero from below, midnight and a day boundary', () => {
    const midnight = Date.UTC(2026, 2, 29);
    const readings: Reading[] = [
      { t: midnight - 1, c: -50, rh: 0, line: 1 },
      { t: midnight, c: 70, rh: 100, line: 2 },
      { t: midnight + 1, c: -0.00004, rh: null, line: 3 },
      { t: midnight + 86_399_999, c: -0.00005, rh: 99.995, line: 4 },
      { t: midnight + 86_400_000, c: 3.14159, rh: 45.5, line: 5 },
    ];
    expect(loadDataRows(packReadings(readings)).toString('ascii')).toBe(reference(readings));
    expect(loadDataRows(packReadings([])).length).toBe(0);
  });
});
