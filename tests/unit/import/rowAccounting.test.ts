import { describe, expect, it } from 'vitest';
import { MAX_NOTED_LINES } from '../../../shared/import/types';
import { readLoggerFile } from '../../../shared/import/readLoggerFile';
import { readText, sourceOf, utc } from './readText';

describe('every row accounted for', () => {
  const text = [
    'Crisper fridge C-03', // 1 preamble
    'Time,Temp °C,RH %', // 2 header
    '2025-02-10 00:00,1.5,93', // 3 accepted
    '', // 4 blank: skipped, not a row
    '2025-02-10 00:30,ERR,93', // 5 sensor code
    '2025-02-10 01:00,----,93', // 6 sensor code
    '2025-02-10 01:30,-999,93', // 7 sensor code
    '2025-02-10 02:00,85.3,93', // 8 implausible
    '2025-02-10 02:30,abc,93', // 9 not a number
    '2025-02-31 03:00,1.4,93', // 10 no such day
    'not a time,1.6,92', // 11 bad time
    '2025-02-10 03:30', // 12 missing field
    '2025-02-10 04:00,,93', // 13 missing temperature
    '2025-02-10 04:30,1.7,130', // 14 humidity out of range
    '2025-02-10 05:00,1.8,', // 15 accepted, no humidity
    '2025-02-10 05:00,1.8,', // 16 duplicate
    '2025-02-10 05:00,2.9,90', // 17 conflict
    ';;', // 18 stray separators: not a row? (one field here: counted)
    '2025-02-10 05:30,-50.0,93', // 19 accepted: the plausible range includes −50 °C
  ].join('\n');

  it('rejects with physical line numbers and reasons; duplicates and conflicts are counted apart', async () => {
    const { summary, readings } = await readText(text);
    expect(summary.rejectedLines.map((note) => note.line)).toEqual([5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 18]);
    expect(summary.rejectedLines[0].reason).toBe('sensor error code "ERR" instead of a temperature');
    expect(summary.rejectedLines[3].reason).toContain('implausible temperature 85.3 °C');
    expect(summary.rejectedLines[5].reason).toBe('no day 31 in month 2 of 2025');
    expect(summary.rejectedLines[7].reason).toBe('missing fields: 1 found, 2 needed');
    expect(summary.rejectedLines[8].reason).toBe('missing temperature');
    expect(summary.rejectedLines[9].reason).toBe('humidity 130 % is outside 0–100 %');
    expect(summary.conflictLines).toEqual([
      { line: 17, reason: 'same time as line 15 but a different reading (1.8 °C there, 2.9 °C here); line 15 kept' },
    ]);
    expect(summary.rows).toEqual({ total: 16, accepted: 3, rejected: 11, duplicates: 1, conflicts: 1 });
    const { total, accepted, rejected, duplicates, conflicts } = summary.rows;
    expect(accepted + rejected + duplicates + conflicts).toBe(total);
    expect(readings).toEqual([
      { t: utc('2025-02-10T00:00:00Z'), c: 1.5, rh: 93, line: 3 },
      { t: utc('2025-02-10T05:00:00Z'), c: 1.8, rh: null, line: 15 },
      { t: utc('2025-02-10T05:30:00Z'), c: -50, rh: 93, line: 19 },
    ]);
    expect(summary.span).toEqual({ first: utc('2025-02-10T00:00:00Z'), last: utc('2025-02-10T05:30:00Z') });
  });

  it('finds duplicates and conflicts in a file that is not in time order', async () => {
    const stamps = ['08:00', '09:00', '07:00', '08:30', '07:00', '08:30', '09:00', '06:00'];
    const temps = ['1.0', '2.0', '3.0', '4.0', '3.0', '4.5', '2.0', '5.0'];
    const text = ['Time,Temp °C', ...stamps.map((time, i) => `2025-02-10 ${time},${temps[i]}`)].join('\n');
    const { summary, readings } = await readText(text);
    expect(summary.rows).toEqual({ total: 8, accepted: 5, rejected: 0, duplicates: 2, conflicts: 1 });
    expect(summary.conflictLines.map((note) => note.line)).toEqual([7]);
    expect(readings.map((r) => r.line)).toEqual([2, 3, 4, 5, 9]);
  });

  it('counts physical lines through a quoted field that spans lines (RFC 4180 §2.6)', async () => {
    const later = ['01:00', '01:30', '02:00', '02:30', '03:00'].map((time) => `2025-02-10 ${time},1.7,ok`);
    const { readings } = await readText(['Time,Temp °C,Note', '2025-02-10 00:00,1.5,"door', 'opened"', '2025-02-10 00:30,1.6,ok', ...later].join('\n'));
    expect(readings.map((r) => r.line)).toEqual([2, 4, 5, 6, 7, 8, 9]);
  });

  it('hands readings on in batches of the asked size', async () => {
    const rows = Array.from({ length: 2500 }, (_, i) => `${new Date(utc('2025-02-10T00:00:00Z') + i * 60_000).toISOString()},2.0`);
    const { batches, readings } = await readText(['Time,Temp °C', ...rows].join('\n'), { batchSize: 1000 }, 4096);
    expect(readings).toHaveLength(2500);
    expect(batches).toBeGreaterThanOrEqual(3);
  });

  it('tells the layout through onDetected once, before the first batch', async () => {
    const events: string[] = [];
    const bytes = new TextEncoder().encode('Logger: K-01\nTime,Temp °C\n2025-02-10 00:00,1.5\n2025-02-10 00:30,1.6\n');
    await readLoggerFile(
      sourceOf(bytes),
      { defaultZone: 'UTC' },
      async (batch) => {
        events.push(`batch ${batch.length}`);
      },
      {
        onDetected: async (detected) => {
          events.push(`detected ${detected.loggerHint}`);
        },
      },
    );
    expect(events).toEqual(['detected K-01', 'batch 2']);
  });

  it('keeps only the first 1,000 rejection notes but counts them all', async () => {
    const rows = Array.from({ length: 1500 }, (_, i) => `${new Date(utc('2025-02-10T00:00:00Z') + i * 60_000).toISOString()},ERR`);
    rows.push('2025-03-01T00:00:00Z,2.0');
    const { summary } = await readText(['Time,Temp °C', ...rows].join('\n'));
    expect(summary.rows.rejected).toBe(1500);
    expect(summary.rejectedLines).toHaveLength(MAX_NOTED_LINES);
    expect(summary.rejectedLines.at(-1)?.line).toBe(MAX_NOTED_LINES + 1);
  });
});
