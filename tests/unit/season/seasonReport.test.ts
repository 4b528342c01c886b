import { describe, expect, it } from 'vitest';
import { compareSeasons } from '../../../shared/season/compareSeasons';
import { ASSOCIATION_CAUTION, strongestDifferences } from '../../../shared/season/findings';
import { describeTake } from '../../../shared/season/formatTake';
import { buildSeasonReport } from '../../../shared/season/seasonReport';
import { takeFigure } from '../../../shared/season/takeFigure';
import type { TakeGroup } from '../../../shared/season/types';
import { outcome, seasonFixture } from './fixtures';

// Every expected figure below was worked out by hand from seasonFixture(): grafts grown ÷ grafts planted per
// group, pooled over the group's assessed batches.
const report = buildSeasonReport(2026, seasonFixture());
const groups = (key: string) => report.dimensions.find((d) => d.key === key)!.groups.map((g) => [g.label, g.grown, g.planted, g.batches]);

describe('buildSeasonReport on the hand-computed fixture', () => {
  it('counts batches and grafts, and leaves unassessed batches out of take', () => {
    expect(report).toMatchObject({ season: 2026, label: '2025–26', from: '2025-07-01', to: '2026-06-30', unit: 'C' });
    expect(report.counts).toEqual({ batches: 7, grafts: 317, plantedBatches: 6, plantedGrafts: 280, assessedBatches: 5, awaitingAssessment: 1 });
    expect(report.overall).toMatchObject({ batches: 5, planted: 260, grown: 190 });
    expect(report.overall!.takePct).toBeCloseTo((100 * 190) / 260, 12);
  });

  it('groups by storage room, the catch-all last', () => {
    expect(groups('room')).toEqual([['Cellar', 130, 150, 2], ['Garage', 50, 100, 2], ['No room recorded', 10, 10, 1]]);
  });

  it('groups by freeze band: 0, under 1, 1 to 6, over 6, then unmeasured', () => {
    expect(groups('freeze')).toEqual([
      ['No freeze hours', 90, 100, 1],
      ['Under 1 freeze hour', 40, 50, 1],
      ['1 to 6 freeze hours', 20, 40, 1],
      ['Over 6 freeze hours', 30, 60, 1],
      ['No logger record', 10, 10, 1],
    ]);
  });

  // Assessed, measured batches have 10, 10, 30 and 60 °C·h outside the band (the unassessed 100 °C·h batch is not
  // among them): type-7 cuts at positions 0.75, 1.5, 2.25 give 10, 20 and 37.5.
  it('splits degree-hours outside the band at the quartiles of the assessed batches', () => {
    expect(report.degreeHourCuts).toEqual([10, 20, 37.5]);
    expect(groups('degreeHours')).toEqual([
      ['Lowest quarter (up to 10 °C·h)', 130, 150, 2],
      ['Third quarter (20 °C·h to 38 °C·h)', 20, 40, 1],
      ['Highest quarter (over 38 °C·h)', 30, 60, 1],
      ['No logger record', 10, 10, 1],
    ]);
  });

  it('groups text fields regardless of capitals and spaces, in label order, "not recorded" last', () => {
    expect(groups('species')).toEqual([['Apple', 160, 210, 3], ['Pear', 30, 50, 2]]);
    expect(groups('cultivar')).toEqual([['Conference', 30, 50, 2], ['Gala', 160, 210, 3]]);
    expect(groups('rootstock')).toEqual([['M.9', 30, 60, 1], ['M.26', 130, 150, 2], ['Quince A', 30, 50, 2]]);
    expect(groups('method')).toEqual([['cleft', 50, 60, 2], ['whip-and-tongue', 140, 200, 3]]);
    expect(groups('grafter')).toEqual([['Ana', 130, 150, 2], ['Ben', 50, 100, 2], ['Not recorded', 10, 10, 1]]);
  });

  it('gives every group its Wilson interval around its take', () => {
    for (const d of report.dimensions) {
      for (const g of d.groups) {
        expect(g.lowPct).toBeLessThanOrEqual(g.takePct);
        expect(g.highPct).toBeGreaterThanOrEqual(g.takePct);
      }
    }
  });

  // °F·h = °C·h × 9/5 (NIST SP 811 B.9, a temperature interval): cut points scale, membership does not move.
  it('reports in °F without changing any group', () => {
    const inF = buildSeasonReport(2026, seasonFixture(), 'F');
    expect(inF.degreeHourCuts).toEqual([18, 36, 67.5]);
    expect(inF.batches[0].exposure!.aboveDegreeHours).toBeCloseTo(18, 12);
    expect(inF.dimensions.map((d) => d.groups.map((g) => g.planted))).toEqual(report.dimensions.map((d) => d.groups.map((g) => g.planted)));
    expect(inF.dimensions[2].groups[0].label).toBe('Lowest quarter (up to 18 °F·h)');
  });

  it('has no figures for a season without assessments', () => {
    const empty = buildSeasonReport(2027, [outcome({ planted: 0, grown: null })]);
    expect(empty.overall).toBeNull();
    expect(empty.degreeHourCuts).toBeNull();
    expect(empty.dimensions.every((d) => d.groups.length === 0)).toBe(true);
    expect(empty.findings).toEqual([]);
  });
});

describe('strongestDifferences', () => {
  // Wilson 95 % intervals (hand-computed): Cellar 130/150 80.30–91.20, Garage 50/100 40.38–59.62 → gap 20.69;
  // Ana/Ben the same; M.26 130/150 vs Quince A 30/50 (46.18–72.39) → 7.91 (M.9 is a single batch, so the lower
  // end among rootstocks is Quince A). Freeze bands and degree-hour quarters hold single batches here, so they are
  // not singled out; species (Apple 69.99–81.45 vs Pear 46.18–72.39), cultivar and method overlap.
  it('lists the differences whose intervals do not overlap, widest gap first, between groups of two or more batches', () => {
    expect(report.findings.map((f) => [f.dimension, f.higher.label, f.lower.label])).toEqual([
      ['room', 'Cellar', 'Garage'],
      ['grafter', 'Ana', 'Ben'],
      ['rootstock', 'M.26', 'Quince A'],
    ]);
    expect(report.findings[0].gapPct).toBeCloseTo(80.302 - 59.617, 2);
    expect(report.findings.every((f) => f.clear)).toBe(true);
  });

  // Each group is two batches of the given counts; gaps between Wilson bounds on 200 grafts, hand-computed:
  // d 81.13, b 43.59, a 28.15, e 27.53, c 7.36 points.
  it('keeps at most four findings, widest gap first', () => {
    const group = (key: string, grown: number, planted: number): TakeGroup => ({ key, label: key, ...takeFigure([outcome({ planted, grown }), outcome({ planted, grown })])! });
    const dimension = (key: string, [hiGrown, loGrown]: [number, number]) => ({ key, title: key, groups: [group('high', hiGrown, 100), group('low', loGrown, 100)] });
    const found = strongestDifferences([dimension('a', [90, 50]), dimension('b', [95, 40]), dimension('c', [80, 60]), dimension('d', [99, 10]), dimension('e', [85, 45])]);
    expect(found.map((f) => f.dimension)).toEqual(['d', 'b', 'a', 'e']);
  });

  it('words a finding with both takes, their grafts and intervals', () => {
    expect(report.findings[0].text).toBe(
      'Storage room: grafts in “Cellar” took 87 % (130 of 150 grafts; 95 % interval 80–91 %), against 50 % (50 of 100 grafts; 95 % interval 40–60 %) in “Garage”. ' +
        'The intervals do not overlap, so chance alone is an unlikely explanation.',
    );
    expect(describeTake(report.overall!)).toBe('73 % (190 of 260 grafts; 95 % interval 67–78 %)');
    expect(ASSOCIATION_CAUTION).toMatch(/associations .* not proof/);
  });

  it('offers the largest difference as possibly chance when no intervals separate', () => {
    const species = report.dimensions.filter((d) => d.key === 'species' || d.key === 'method');
    const [only] = strongestDifferences(species);
    // Apple 76.19 % vs Pear 60.00 % (gap 16.2 points) beats cleft 83.33 % vs whip 70.00 % (13.3 points).
    expect(strongestDifferences(species)).toHaveLength(1);
    expect(only).toMatchObject({ dimension: 'species', clear: false });
    expect(only.text).toMatch(/may well be chance\.$/);
  });

  it('ignores groups under 20 grafts, single batches and catch-all groups', () => {
    const small = buildSeasonReport(2026, [
      outcome({ planted: 10, grown: 10, grafter: 'Cy' }),
      outcome({ planted: 9, grown: 9, grafter: 'Cy' }),
      outcome({ planted: 200, grown: 20, grafter: '' }),
      outcome({ planted: 200, grown: 20, grafter: '' }),
      outcome({ planted: 300, grown: 290, grafter: 'Ed' }),
      outcome({ planted: 100, grown: 50, grafter: 'Di' }),
      outcome({ planted: 100, grown: 50, grafter: 'Di' }),
    ]);
    expect(small.findings.filter((f) => f.dimension === 'grafter')).toEqual([]);
  });
});

describe('compareSeasons', () => {
  it('sets each group beside the same group of the season before, keeping groups only one season had', () => {
    const before = buildSeasonReport(2025, [
      outcome({ planted: 80, grown: 60, room: { id: 2, name: 'Garage', hours: 900 } }),
      outcome({ planted: 30, grown: 30, room: { id: 3, name: 'Shed', hours: 500 } }),
    ]);
    const comparison = compareSeasons(report, before);
    expect(comparison).toMatchObject({ season: 2026, previousSeason: 2025, overall: { current: { planted: 260 }, previous: { planted: 110 } } });
    const rooms = comparison.dimensions.find((d) => d.key === 'room')!.rows;
    expect(rooms.map((r) => [r.label, r.current?.planted ?? null, r.previous?.planted ?? null])).toEqual([
      ['Cellar', 150, null],
      ['Garage', 100, 80],
      ['No room recorded', 10, null],
      ['Shed', null, 30],
    ]);
  });
});
