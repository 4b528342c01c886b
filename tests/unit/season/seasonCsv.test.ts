import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { seasonCsv } from '../../../shared/season/seasonCsv';
import { buildSeasonReport } from '../../../shared/season/seasonReport';
import { outcome, plantedExposureOf, seasonFixture } from './fixtures';

const read = (text: string) => parse(text, { record_delimiter: '\r\n', columns: true }) as Record<string, string>[];

describe('seasonCsv', () => {
  const report = buildSeasonReport(2026, seasonFixture());
  const rows = read(seasonCsv(report));

  it('has one record per batch of the season, read back by csv-parse', () => {
    expect(rows).toHaveLength(report.batches.length);
    expect(rows.map((r) => r.Batch)).toEqual(report.batches.map((b) => b.code));
  });

  // Batch 4 of the fixture: 30 of 60 grown, 8 freeze hours, 60 °C·h below the band, the highest quarter.
  it('carries storage figures and outcome as plain numbers a spreadsheet reads', () => {
    const r = rows[3];
    expect(r).toMatchObject({
      Season: '2026', Species: 'Apple', Rootstock: 'M.9', Planted: '60', Grown: '30', 'Take (%)': '50',
      'Freeze hours': '8', 'Freeze band': 'Over 6 freeze hours', 'Below band (°C·h)': '60', 'Outside band (°C·h)': '60',
      'Degree-hour quarter': 'Q4', 'Storage room (most hours)': 'Garage', 'Planted where': 'Bed 1',
    });
    // Wilson 30/60 = 37.735–62.265 % (hand-computed), to one decimal.
    expect([r['Take 95 % low (%)'], r['Take 95 % high (%)']]).toEqual(['37.7', '62.3']);
  });

  it('leaves unknown figures empty rather than zero', () => {
    const notPlanted = rows[6];
    expect(notPlanted).toMatchObject({ Planted: '0', Grown: '', 'Take (%)': '', 'Freeze hours': '', 'First planted on': '' });
  });

  it('quotes text with commas, quotes and line breaks so every record keeps its columns', () => {
    const odd = buildSeasonReport(2026, [
      outcome({ planted: 10, grown: 9, cultivar: 'Reine des "Reinettes", old', locations: ['Bed 1', 'Field, south'], exposure: plantedExposureOf({ freezeHours: 0, belowDH: 0, aboveDH: 0 }) }),
    ]);
    const [record] = read(seasonCsv(odd));
    expect(record.Cultivar).toBe('Reine des "Reinettes", old');
    expect(record['Planted where']).toBe('Bed 1; Field, south');
  });

  it('names the report unit in degree-hour headers', () => {
    const header = Object.keys(read(seasonCsv(buildSeasonReport(2026, seasonFixture(), 'F')))[0]);
    expect(header).toContain('Outside band (°F·h)');
  });
});
