import { describe, expect, it } from 'vitest';
import { readText, utc } from './readText';

// Transition instants from the IANA tz database (read through luxon / Node's ICU):
// Europe/Berlin 2024-10-27 03:00 CEST → 02:00 CET at 01:00 UTC; 2024-03-31 02:00 CET → 03:00 CEST at 01:00 UTC.
// America/New_York 2025-03-09 02:00 EST → 03:00 EDT at 07:00 UTC; 2025-11-02 02:00 EDT → 01:00 EST at 06:00 UTC.
const rows = (...stamps: string[]) => ['Local time,Temp °C', ...stamps.map((stamp, i) => `${stamp},${(20 + i / 10).toFixed(1)}`)].join('\n');

describe('autumn fall-back: the repeated hour follows the order of the readings', () => {
  it('Europe/Berlin 2024-10-27, 30-minute readings through 02:00–02:59 twice', async () => {
    const { summary, readings } = await readText(
      rows('2024-10-27 01:30', '2024-10-27 02:00', '2024-10-27 02:30', '2024-10-27 02:00', '2024-10-27 02:30', '2024-10-27 03:00'),
      { tz: 'Europe/Berlin' },
    );
    expect(summary.rows).toEqual({ total: 6, accepted: 6, rejected: 0, duplicates: 0, conflicts: 0 });
    expect(readings.map((r) => r.t)).toEqual([
      utc('2024-10-26T23:30:00Z'), // 01:30 CEST
      utc('2024-10-27T00:00:00Z'), // 02:00 CEST
      utc('2024-10-27T00:30:00Z'), // 02:30 CEST
      utc('2024-10-27T01:00:00Z'), // 02:00 CET
      utc('2024-10-27T01:30:00Z'), // 02:30 CET
      utc('2024-10-27T02:00:00Z'), // 03:00 CET
    ]);
  });

  it('America/New_York 2025-11-02, newest-first file', async () => {
    const { summary, readings } = await readText(
      rows('2025-11-02 02:00', '2025-11-02 01:30', '2025-11-02 01:00', '2025-11-02 01:30', '2025-11-02 01:00', '2025-11-02 00:30'),
      { tz: 'America/New_York' },
    );
    expect(summary.detected.timestamp.order).toBe('descending');
    expect(readings.map((r) => r.t)).toEqual([
      utc('2025-11-02T07:00:00Z'), // 02:00 EST
      utc('2025-11-02T06:30:00Z'), // 01:30 EST
      utc('2025-11-02T06:00:00Z'), // 01:00 EST
      utc('2025-11-02T05:30:00Z'), // 01:30 EDT
      utc('2025-11-02T05:00:00Z'), // 01:00 EDT
      utc('2025-11-02T04:30:00Z'), // 00:30 EDT
    ]);
  });
});

describe('spring forward: a local time that never happened is refused for its row', () => {
  it('Europe/Berlin 2024-03-31 02:30 does not exist', async () => {
    const { summary, readings } = await readText(rows('2024-03-31 01:30', '2024-03-31 02:30', '2024-03-31 03:30'), { tz: 'Europe/Berlin' });
    expect(summary.rows).toMatchObject({ total: 3, accepted: 2, rejected: 1 });
    expect(summary.rejectedLines).toEqual([
      { line: 3, reason: 'local time 2024-03-31 02:30 does not exist in Europe/Berlin (the clocks went forward then)' },
    ]);
    expect(readings.map((r) => r.t)).toEqual([utc('2024-03-31T00:30:00Z'), utc('2024-03-31T01:30:00Z')]);
  });

  it('America/New_York 2025-03-09: 01:45 EST is followed by 03:00 EDT, 15 minutes later', async () => {
    const { readings } = await readText(rows('2025-03-09 01:45', '2025-03-09 03:00'), { tz: 'America/New_York' });
    expect(readings[1].t - readings[0].t).toBe(15 * 60_000);
    expect(readings[1].t).toBe(utc('2025-03-09T07:00:00Z'));
  });

  it('the sample file crossing the New York change reads every row at a steady 15 minutes', async () => {
    const { readFileSync } = await import('node:fs');
    const text = readFileSync(new URL('../../../samples/root-cellar-new-york-dst.csv', import.meta.url), 'utf8');
    const { readings, summary } = await readText(text, { tz: 'America/New_York' });
    expect(summary.rows.rejected).toBe(0);
    const steps = new Set(readings.slice(1).map((r, i) => r.t - readings[i].t));
    expect([...steps]).toEqual([15 * 60_000]);
  });
});

describe('zones across a long file', () => {
  it('a year of hourly Berlin local times (spring hour missing, autumn hour twice) reads as steady one-hour UTC steps', async () => {
    // Written as local wall-clock time: the spring-forward hour is missing, the fall-back hour appears twice.
    const stamps: string[] = [];
    const formatter = new Intl.DateTimeFormat('sv-SE', {
      timeZone: 'Europe/Berlin',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
    });
    for (let t = utc('2024-01-01T00:00:00Z'); t < utc('2025-01-01T00:00:00Z'); t += 3_600_000) stamps.push(formatter.format(t));
    const { readings, summary } = await readText(['Time,Temp °C', ...stamps.map((s) => `${s},4.0`)].join('\n'), { tz: 'Europe/Berlin' });
    expect(summary.rows.accepted).toBe(stamps.length);
    expect(readings.every((r, i) => i === 0 || r.t - readings[i - 1].t === 3_600_000)).toBe(true);
    expect(readings[0].t).toBe(utc('2024-01-01T00:00:00Z'));
  });
});
