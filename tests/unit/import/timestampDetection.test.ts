import { describe, expect, it } from 'vitest';
import { readLoggerFile } from '../../../shared/import/readLoggerFile';
import { bytesOf, importErrorOf, readText, sourceOf, utc } from './readText';

/** Header plus rows of "timestamp,temperature" in °C. */
const file = (...stamps: string[]) => ['Time,Temp °C', ...stamps.map((stamp, i) => `${stamp},${3 + i / 10}`)].join('\n');

describe('one date-time column', () => {
  it('ISO 8601 extended format with offsets; the written UTC offset wins over --tz (ISO 8601 time-zone designators)', async () => {
    const { summary, readings } = await readText(file('2025-01-13T08:00:00+01:00', '2025-01-13T08:30:00.250-05:30', '2025-01-13T09:00:00Z'), {
      tz: 'America/New_York',
    });
    expect(summary.detected.timestamp).toMatchObject({ kind: 'datetime', format: 'YYYY-MM-DDTHH:mm:ss±HH:MM', zone: 'explicit offset' });
    expect(readings.map((r) => r.t)).toEqual([utc('2025-01-13T07:00:00Z'), utc('2025-01-13T14:00:00.250Z'), utc('2025-01-13T09:00:00Z')]);
  });

  it('ISO 8601 basic format, with and without seconds, fractions and offsets (ISO 8601 basic format, as the standard writes it without separators)', async () => {
    const { summary, readings } = await readText(file('20250113T080000+0100', '20250113T083000.250-0530', '20250113T090000Z'), { tz: 'America/New_York' });
    expect(summary.detected.timestamp).toMatchObject({ kind: 'datetime', format: 'YYYYMMDDTHHmmss±HHMM', zone: 'explicit offset' });
    expect(readings.map((r) => r.t)).toEqual([utc('2025-01-13T07:00:00Z'), utc('2025-01-13T14:00:00.250Z'), utc('2025-01-13T09:00:00Z')]);
    const local = await readText(file('20250113T0800', '20250113T0830'), { tz: 'Europe/Berlin' });
    expect(local.readings.map((r) => r.t)).toEqual([utc('2025-01-13T07:00:00Z'), utc('2025-01-13T07:30:00Z')]);
    expect(local.summary.detected.timestamp).toMatchObject({ format: 'YYYYMMDDTHHmm', zone: 'Europe/Berlin' });
    // Not a time of day, or no such month: rejected with the reason, like any other row.
    const bad = await readText(file('20250113T0800', '20251313T0900', '20250113T2560'), { tz: 'UTC' });
    expect(bad.summary.rows).toMatchObject({ accepted: 1, rejected: 2 });
  });

  it('ISO 8601 without offset takes the --tz zone, else the default zone', async () => {
    const withTz = await readText(file('2025-01-13 08:00:00'), { tz: 'Europe/Berlin' });
    expect(withTz.readings[0].t).toBe(utc('2025-01-13T07:00:00Z'));
    expect(withTz.summary.detected.timestamp).toMatchObject({ zone: 'Europe/Berlin', zoneSource: 'option' });
    const byDefault = await readText(file('2025-01-13 08:00:00'), { defaultZone: 'America/New_York' });
    expect(byDefault.readings[0].t).toBe(utc('2025-01-13T13:00:00Z'));
    expect(byDefault.summary.detected.timestamp).toMatchObject({ zone: 'America/New_York', zoneSource: 'default' });
  });

  it('a fixed offset as --tz', async () => {
    const { readings, summary } = await readText(file('2025-01-13 08:00'), { tz: '+01:00' });
    expect(readings[0].t).toBe(utc('2025-01-13T07:00:00Z'));
    expect(summary.detected.timestamp.zone).toBe('+01:00');
  });

  it('M/D/Y with a 12-hour clock (12 AM is midnight, 12 PM is noon)', async () => {
    const { summary, readings } = await readText(file('1/20/2025 12:00 AM', '1/20/2025 12:20 PM', '1/20/2025 1:40 PM'));
    expect(summary.detected.timestamp).toMatchObject({ format: 'MM/DD/YYYY hh:mm AM/PM', clock: '12h', dateOrder: 'mdy', dateOrderSource: 'values' });
    expect(readings.map((r) => r.t)).toEqual([utc('2025-01-20T00:00:00Z'), utc('2025-01-20T12:20:00Z'), utc('2025-01-20T13:40:00Z')]);
  });

  it('D.M.Y with dots, D-M-Y with dashes and two-digit years', async () => {
    const dots = await readText(file('20.01.2025 18:00'));
    expect(dots.summary.detected.timestamp).toMatchObject({ format: 'DD.MM.YYYY HH:mm', dateOrder: 'dmy', dateOrderInferred: true });
    expect(dots.readings[0].t).toBe(utc('2025-01-20T18:00:00Z'));
    const dashes = await readText(file('20-01-25 18:00:30'));
    expect(dashes.summary.detected.timestamp.format).toBe('DD-MM-YY HH:mm:ss');
    expect(dashes.readings[0].t).toBe(utc('2025-01-20T18:00:30Z'));
  });

  it('Y/M/D with slashes', async () => {
    const { summary, readings } = await readText(file('2025/01/20 18:00'));
    expect(summary.detected.timestamp).toMatchObject({ dateOrder: 'ymd', dateOrderSource: 'format', dateOrderInferred: false });
    expect(readings[0].t).toBe(utc('2025-01-20T18:00:00Z'));
  });
});

describe('separate date and time columns', () => {
  it('joins a date column and a time column', async () => {
    const { summary, readings } = await readText('Date;Time;Temp °C;RH\n20.01.2025;18:00;3,5;88\n20.01.2025;18:30:15;3,6;88\n');
    expect(summary.detected.timestamp).toMatchObject({ kind: 'date+time', columns: ['Date', 'Time'], format: 'DD.MM.YYYY + HH:mm' });
    expect(readings.map((r) => r.t)).toEqual([utc('2025-01-20T18:00:00Z'), utc('2025-01-20T18:30:15Z')]);
    expect(readings.map((r) => r.rh)).toEqual([88, 88]);
  });

  it('with a 12-hour clock in the time column', async () => {
    const { readings, summary } = await readText('Date,Time,Temp F\n2025-01-20,6:00 PM,38.3\n');
    expect(summary.detected.timestamp.clock).toBe('12h');
    expect(readings[0].t).toBe(utc('2025-01-20T18:00:00Z'));
  });
});

describe('Unix time', () => {
  it('epoch seconds, with no header', async () => {
    const { summary, readings } = await readText('1737396000,3.5\n1737396600,3.6\n', { unit: 'C', tz: 'Europe/Berlin' });
    expect(summary.detected.timestamp).toMatchObject({ kind: 'epoch-s', zone: 'UTC', zoneSource: 'epoch (UTC)' });
    expect(readings.map((r) => r.t)).toEqual([utc('2025-01-20T18:00:00Z'), utc('2025-01-20T18:10:00Z')]);
  });

  it('epoch milliseconds', async () => {
    const { summary, readings } = await readText('unix_ms,temperature_c\n1737396000123,3.5\n');
    expect(summary.detected.timestamp.kind).toBe('epoch-ms');
    expect(readings[0].t).toBe(1737396000123);
  });
});

describe('day/month order', () => {
  const thirtyMinutes = (days: number, write: (d: Date) => string) =>
    Array.from({ length: days * 48 }, (_, i) => write(new Date(Date.UTC(2025, 1, 3, 8) + i * 1_800_000)));
  const two = (n: number) => String(n).padStart(2, '0');

  it('picks the order under which an all-ambiguous series is steady and says it was inferred', async () => {
    // 03.02.2025 … 05.02.2025: every day ≤ 12, so each date reads both ways; month-first jumps a month each midnight.
    const stamps = thirtyMinutes(3, (d) => `${two(d.getUTCDate())}/${two(d.getUTCMonth() + 1)}/${d.getUTCFullYear()} ${two(d.getUTCHours())}:${two(d.getUTCMinutes())}`);
    const { summary, readings } = await readText(file(...stamps));
    expect(summary.detected.timestamp).toMatchObject({ dateOrder: 'dmy', dateOrderSource: 'series', dateOrderInferred: true });
    expect(readings[0].t).toBe(utc('2025-02-03T08:00:00Z'));
    const monthFirst = thirtyMinutes(3, (d) => `${two(d.getUTCMonth() + 1)}/${two(d.getUTCDate())}/${d.getUTCFullYear()} ${two(d.getUTCHours())}:${two(d.getUTCMinutes())}`);
    expect((await readText(file(...monthFirst))).summary.detected.timestamp.dateOrder).toBe('mdy');
  });

  it('scans past the first 64 KiB when the top of the file cannot settle the order', async () => {
    // A day of one-minute rows on 03/02 fills more than 64 KiB; only the next day (04/02) breaks month-first.
    const rows = Array.from({ length: 1600 }, (_, i) => {
      const d = new Date(Date.UTC(2025, 1, 3, 0) + i * 60_000);
      return `${two(d.getUTCDate())}/02/2025 ${two(d.getUTCHours())}:${two(d.getUTCMinutes())}:00,3.5,88,probe ok - channel A - root cellar shelf 2`;
    });
    const bytes = bytesOf(['Time,Temp °C,RH,Note', ...rows].join('\n'));
    expect(bytesOf(rows.slice(0, 1440).join('\n')).length).toBeGreaterThan(64 * 1024 * 1.3);
    let passes = 0;
    const source = sourceOf(bytes, 8192);
    const summary = await readLoggerFile(() => (passes++, source()), { defaultZone: 'UTC' }, async () => {});
    expect(summary.detected.timestamp).toMatchObject({ dateOrder: 'dmy', dateOrderSource: 'series' });
    expect(passes).toBe(3);
  });

  it('stops and asks for --date-order when both orders fit', async () => {
    const error = await importErrorOf(readText(file('03/04/2025 10:00', '03/04/2025 10:30')));
    expect(error.code).toBe('date_order_ambiguous');
    expect(error.message).toContain('--date-order');
  });

  it('takes --date-order when given', async () => {
    const { summary, readings } = await readText(file('03/04/2025 10:00'), { dateOrder: 'mdy' });
    expect(summary.detected.timestamp).toMatchObject({ dateOrder: 'mdy', dateOrderSource: 'option', dateOrderInferred: false });
    expect(readings[0].t).toBe(utc('2025-03-04T10:00:00Z'));
  });

  it('refuses a --date-order that fits none of the dates', async () => {
    const error = await importErrorOf(readText(file('03/04/2025 10:00'), { dateOrder: 'ymd' }));
    expect(error.code).toBe('bad_option');
  });
});
