import { describe, expect, it } from 'vitest';
import { seasonDates, seasonLabel, seasonOf } from '../../../shared/season/seasonOf';

describe('grafting seasons (1 July of N−1 to 30 June of N is season N)', () => {
  it.each([
    ['2025-07-01', 2026],
    ['2025-12-31', 2026],
    ['2026-01-01', 2026],
    ['2026-06-30', 2026],
    ['2026-07-01', 2027],
  ])('%s belongs to season %i', (day, season) => {
    expect(seasonOf(day)).toBe(season);
  });

  it('gives the first and last grafting days and a spoken name', () => {
    expect(seasonDates(2026)).toEqual({ from: '2025-07-01', to: '2026-06-30' });
    expect(seasonLabel(2026)).toBe('2025–26');
    expect(seasonLabel(2000)).toBe('1999–00');
  });

  it('refuses what is not a calendar day or a four-digit season', () => {
    expect(() => seasonOf('26-01-2026')).toThrow();
    expect(() => seasonDates(26)).toThrow();
  });
});
