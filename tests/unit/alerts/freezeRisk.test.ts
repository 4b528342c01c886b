// Freeze risk judged at one instant. The trend check uses Anscombe's data set I (Anscombe, F.J. 1973, "Graphs in
// Statistical Analysis", The American Statistician 27(1):17–21), whose published least-squares line is y = 3.00 + 0.500x.
import { describe, expect, it } from 'vitest';
import { judgeFreezeAt } from '../../../shared/alerts/freezeRisk';
import { HOUR, MIN, T0 } from './fixtures';

const ANSCOMBE_I: [number, number][] = [
  [10, 8.04], [8, 6.95], [13, 7.58], [9, 8.81], [11, 8.33], [14, 9.96], [6, 7.24], [4, 4.26], [12, 10.84], [7, 4.82], [5, 5.68],
];
/** x in hours after T0, temperature 10 − y: the published line becomes c = 7 − 0.5x, falling 0.5 °C per hour. */
const cooling = ANSCOMBE_I.map(([x, y]) => ({ t: T0 + x * HOUR, c: 10 - y })).sort((a, b) => a.t - b.t);
const asOf = T0 + 14 * HOUR;
const logger = { loggerId: 1, label: 'G-1', readings: cooling };

describe('judgeFreezeAt', () => {
  it('Anscombe I: slope −0.500 °C/h; the line is at 0 °C at x = 14 and reaches −2 °C 4 h later (x = 18)', () => {
    const verdict = judgeFreezeAt([logger], asOf, { limitC: -2, trendHours: 12, lookaheadHours: 12 })!;
    expect(verdict.detail.trendCPerHour).toBeCloseTo(-0.5, 3);
    expect(verdict.detail.reachesAt! / HOUR).toBeCloseTo((T0 + 18 * HOUR) / HOUR, 1);
    expect(verdict).toMatchObject({ holds: true, severity: 'warning', detail: { cause: 'trend', valueC: 10 - 9.96 } });
  });

  it('the same line outside a 3 h look-ahead does not hold', () => {
    const verdict = judgeFreezeAt([logger], asOf, { limitC: -2, trendHours: 12, lookaheadHours: 3 })!;
    expect(verdict.holds).toBe(false);
    expect(verdict.detail.cause).toBeUndefined();
  });

  it('a reading at the limit holds and is critical, whatever the trend', () => {
    const flat = [0, 10, 20, 30].map((m) => ({ t: T0 + m * MIN, c: -2 }));
    const verdict = judgeFreezeAt([{ loggerId: 1, label: 'G-1', readings: flat }], T0 + 30 * MIN, { limitC: -2, trendHours: 6, lookaheadHours: 12 })!;
    expect(verdict).toMatchObject({ holds: true, severity: 'critical', detail: { cause: 'at_or_below', valueC: -2 } });
  });

  it('the colder of two loggers speaks for the room', () => {
    const warm = { loggerId: 2, label: 'G-2', readings: [{ t: asOf, c: 3 }] };
    const cold = { loggerId: 3, label: 'G-3', readings: [{ t: asOf, c: -2.5 }] };
    const verdict = judgeFreezeAt([warm, cold], asOf, { limitC: -2, trendHours: 6, lookaheadHours: 12 })!;
    expect(verdict.detail.loggerLabel).toBe('G-3');
  });

  it('two readings are no trend, and a reading older than the 180 min join gap says nothing', () => {
    const two = [{ t: asOf - 10 * MIN, c: 3 }, { t: asOf, c: 1 }];
    expect(judgeFreezeAt([{ loggerId: 1, label: 'G-1', readings: two }], asOf, { limitC: -2, trendHours: 6, lookaheadHours: 12 })!.detail.trendCPerHour).toBeNull();
    expect(judgeFreezeAt([logger], asOf + 181 * MIN, { limitC: -2, trendHours: 6, lookaheadHours: 12 })).toBeNull();
  });
});
