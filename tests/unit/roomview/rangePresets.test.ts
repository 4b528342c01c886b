import { describe, expect, it } from 'vitest';
import { presetRange, requestWidth } from '../../../src/roomview/rangePresets';

const HOUR = 3_600_000;
const NOW = Date.UTC(2026, 11, 2, 3, 30); // 21:30 on 1 December in Chicago (UTC−6)

describe('range presets', () => {
  it('24 h, 7 days and 30 days end now', () => {
    expect(presetRange('24h', NOW, 'America/Chicago')).toEqual({ from: NOW - 24 * HOUR, to: NOW });
    expect(presetRange('30d', NOW, 'America/Chicago')).toEqual({ from: NOW - 720 * HOUR, to: NOW });
  });

  it("the season starts at local midnight of 1 July of the nursery's grafting season", () => {
    expect(presetRange('season', NOW, 'America/Chicago')).toEqual({ from: Date.UTC(2026, 6, 1, 5), to: NOW });
    // In Auckland it is already 2 December 16:30, the same season; midnight there is 12:00 UTC the day before.
    expect(presetRange('season', NOW, 'Pacific/Auckland').from).toBe(Date.UTC(2026, 5, 30, 12));
  });

  it('the season starts when a logger first came into the room, if that is later', () => {
    const placed = Date.UTC(2026, 10, 2, 6);
    expect(presetRange('season', NOW, 'America/Chicago', placed)).toEqual({ from: placed, to: NOW });
    expect(presetRange('season', NOW, 'America/Chicago', Date.UTC(2025, 0, 1)).from).toBe(Date.UTC(2026, 6, 1, 5));
  });
});

describe('request width', () => {
  it('asks for device pixels (up to 2×) in steps of 50, between 50 and 4,000', () => {
    expect(requestWidth(360, 3)).toBe(750);
    expect(requestWidth(1100, 1)).toBe(1100);
    expect(requestWidth(1101, 1)).toBe(1150);
    expect(requestWidth(10, 1)).toBe(50);
    expect(requestWidth(3000, 2)).toBe(4000);
  });
});
