// A season beside the one before: the same groupings, row by row, matched on group keys.
import type { SeasonReport } from './seasonReport';
import type { TakeFigure, TakeGroup } from './types';

export interface ComparedRow {
  key: string;
  label: string;
  current: TakeGroup | null;
  previous: TakeGroup | null;
}

export interface SeasonComparison {
  season: number;
  previousSeason: number;
  overall: { current: TakeFigure | null; previous: TakeFigure | null };
  dimensions: { key: string; title: string; rows: ComparedRow[] }[];
}

/**
 * Rows in this season's order, then groups only the earlier season had. Degree-hour quarters are each season's
 * own (their cut points differ), so those rows compare the harder and easier quarters, not fixed values.
 */
export function compareSeasons(current: SeasonReport, previous: SeasonReport): SeasonComparison {
  return {
    season: current.season,
    previousSeason: previous.season,
    overall: { current: current.overall, previous: previous.overall },
    dimensions: current.dimensions.map((dimension) => {
      const before = new Map((previous.dimensions.find((d) => d.key === dimension.key)?.groups ?? []).map((g) => [g.key, g]));
      const rows: ComparedRow[] = dimension.groups.map((g) => ({ key: g.key, label: g.label, current: g, previous: before.get(g.key) ?? null }));
      const shown = new Set(rows.map((r) => r.key));
      for (const g of before.values()) if (!shown.has(g.key)) rows.push({ key: g.key, label: g.label, current: null, previous: g });
      return { key: dimension.key, title: dimension.title, rows };
    }),
  };
}
