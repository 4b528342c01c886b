import { describe, expect, it } from 'vitest';
import { extremesOf, toChartPoints } from '../../../src/charts/chartPoints';
import { freezeLimitC, roomChartData } from '../../../src/charts/roomChartConfig';
import type { RoomSeries } from '../../../src/charts/seriesTypes';
import { packLine } from '../../../shared/series/packedLine';

const T0 = Date.UTC(2026, 11, 1);
const line = packLine([{ t: T0, v: 1 }, { t: T0 + 60_000, v: null }, { t: T0 + 120_000, v: -2 }, { t: T0 + 180_000, v: 4 }]);

describe('chart points', () => {
  it('keep the breaks as null and convert values', () => {
    expect(toChartPoints(line, (c) => c * 2)).toEqual([{ x: T0, y: 2 }, { x: T0 + 60_000, y: null }, { x: T0 + 120_000, y: -4 }, { x: T0 + 180_000, y: 8 }]);
  });

  it('find the lowest and highest point over several lines, with when', () => {
    const other = packLine([{ t: T0 + 30_000, v: 6 }]);
    expect(extremesOf([line, other])).toEqual({ low: { x: T0 + 120_000, y: -2 }, high: { x: T0 + 30_000, y: 6 } });
    expect(extremesOf([packLine([])])).toBeNull();
  });
});

describe('room chart data', () => {
  const series: RoomSeries = {
    roomId: 1, from: new Date(T0).toISOString(), to: new Date(T0 + 3_600_000).toISOString(), width: 600, bucketMs: 6000, blockMinutes: null, maxGapMinutes: 180,
    loggers: [
      { id: 1, label: 'K-01', windows: [], temperature: line, humidity: packLine([{ t: T0, v: 91 }]) },
      { id: 2, label: 'K-02', windows: [], temperature: line, humidity: null },
    ],
    species: [{ key: 'walnut', name: 'Walnut', freezeC: -1, band: { minC: 24, maxC: 29 }, spans: [] }, { key: 'apple', name: 'Apple', freezeC: -2, band: { minC: 0, maxC: 7.2 }, spans: [] }],
    moves: [],
  };

  it('draws each logger in °F when asked, and humidity only where recorded, on its own axis', () => {
    const data = roomChartData(series, 'F');
    expect(data.datasets.map((d) => [d.label, d.yAxisID])).toEqual([['K-01 °F', 'y'], ['K-01 % RH', 'rh'], ['K-02 °F', 'y']]);
    expect(data.datasets[0].data[0]).toEqual({ x: T0, y: 33.8 });
  });

  it('puts the freeze line at the most sensitive stored species, or −2 °C with none (REFERENCES §3 [DESIGN])', () => {
    expect(freezeLimitC(series)).toBe(-1);
    expect(freezeLimitC({ ...series, species: [] })).toBe(-2);
  });
});
