// Alert sentences and figures as a reader sees them. Conversions are checked against NIST SP 811 (2008) App. B.8/B.9:
// t/°F = 1.8·t/°C + 32 for temperatures, and an interval of 1 °C = 1.8 °F (no offset) for rates and degree-hours.
import { describe, expect, it } from 'vitest';
import { describeBatches, describeCondition, describeLatest, describeSince } from '../../../shared/alerts/describeAlert';
import * as fmt from '../../../shared/alerts/readerFormat';

const C = { unit: 'C' as const, timeZone: 'America/Chicago' };
const F = { unit: 'F' as const, timeZone: 'America/Chicago' };
const at = Date.UTC(2025, 0, 15, 10, 0);

describe('reader formats', () => {
  it('−2 °C is 28.4 °F; a true minus sign for negatives', () => {
    expect(fmt.temperature(-2, C)).toBe('−2.0 °C');
    expect(fmt.temperature(-2, F)).toBe('28.4 °F');
    expect(fmt.temperature(-20, F)).toBe('−4.0 °F');
  });

  it('rates and degree-hours convert as intervals: 0.5 °C/h is 0.9 °F/h, 10 °C·h is 18 °F·h', () => {
    expect(fmt.trend(-0.5, F)).toBe('falling 0.9 °F per hour');
    expect(fmt.trend(0.02, C)).toBe('steady');
    expect(fmt.degreeHours(10, F)).toBe('18.0 °F·h');
  });

  it('instants on the nursery clock: 10:00 UTC on 15 Jan is 04:00 in Chicago (UTC−6, IANA tz database)', () => {
    expect(fmt.instant(at, C)).toBe('Wed 15 Jan, 04:00 GMT-6');
  });

  it('"in" a duration until a moment, "now" at it, nothing once it has passed', () => {
    expect(fmt.fromNow(at + 7.5 * 3_600_000, at)).toBe('in 7.5 h');
    expect(fmt.fromNow(at + 20 * 60_000, at)).toBe('in 20 min');
    expect(fmt.fromNow(at, at)).toBe('now');
    expect(fmt.fromNow(at - 3_600_000, at)).toBeNull();
  });
});

describe('alert sentences', () => {
  it('freeze risk by reading and by trend', () => {
    expect(describeCondition({ rule: 'freeze_risk', detail: { cause: 'at_or_below', valueC: -2.5, limitC: -2 } }, C, at)).toBe(
      'A reading of −2.5 °C is at or below the freeze limit of −2.0 °C.',
    );
    expect(describeCondition({ rule: 'freeze_risk', detail: { cause: 'trend', limitC: -2, windowHours: 6, reachesAt: at + 4 * 3_600_000 } }, F, at)).toBe(
      'The trend of the last 6.0 h reaches the freeze limit of 28.4 °F around Wed 15 Jan, 08:00 GMT-6 (in 4.0 h).',
    );
  });

  it('out of band names the side with more hours; silence names the logger', () => {
    const band = { minC: 0, maxC: 7.2 };
    expect(describeCondition({ rule: 'out_of_band', detail: { band, hoursBelow: 7.25, hoursAbove: 0, windowHours: 24, allowedHours: 6 } }, C, at)).toBe(
      '7.3 h below its band (0.0 °C to 7.2 °C) in the last 24 h; the allowance is 6.0 h.',
    );
    expect(describeCondition({ rule: 'silent_logger', detail: { loggerLabel: 'K-02', lastReadingAt: null, maxAgeHours: 26 } }, C, at)).toBe(
      'K-02 has sent no reading at all for more than 26 h.',
    );
  });

  it('a start traced only as far as the horizon reads "or earlier"', () => {
    expect(describeSince(at, { sinceCapped: true }, C)).toBe('Wed 15 Jan, 04:00 GMT-6 or earlier');
    expect(describeSince(at, {}, C)).toBe('Wed 15 Jan, 04:00 GMT-6');
  });

  it('the latest reading with its logger and trend, and the batches at stake', () => {
    expect(describeLatest({ valueC: 1.25, readingAt: at, loggerLabel: 'K-02', trendCPerHour: -0.8 }, C)).toBe(
      '1.3 °C at Wed 15 Jan, 04:00 GMT-6 (logger K-02), falling 0.8 °C per hour',
    );
    expect(describeLatest({ degreeHours: 3 }, C)).toBeNull();
    expect(describeBatches({ batches: [{ id: 1, code: '25-APL-001', species: 'Apple', count: 240 }, { id: 2, code: '25-PER-002', species: 'Pear', count: 60 }] })).toBe(
      '25-APL-001: Apple, 240 grafts; 25-PER-002: Pear, 60 grafts',
    );
  });
});
