// Grouping batches by how hard their storage was: fixed freeze-hour bands, and quartiles of degree-hours
// outside the species' band.

export const FREEZE_BANDS = [
  { key: 'none', label: 'No freeze hours' },
  { key: 'under-1', label: 'Under 1 freeze hour' },
  { key: '1-6', label: '1 to 6 freeze hours' },
  { key: 'over-6', label: 'Over 6 freeze hours' },
] as const;
export type FreezeBandKey = (typeof FREEZE_BANDS)[number]['key'];

/** 0 exactly; above 0 and under 1; 1 to 6 inclusive; above 6. */
export function freezeBand(freezeHours: number): FreezeBandKey {
  if (!(freezeHours >= 0)) throw new Error(`freeze hours must be a number ≥ 0 (got ${freezeHours})`);
  if (freezeHours === 0) return 'none';
  if (freezeHours < 1) return 'under-1';
  if (freezeHours <= 6) return '1-6';
  return 'over-6';
}

/**
 * The 25th, 50th and 75th percentiles, interpolated between order statistics at position (n − 1)·p — the
 * definition Hyndman & Fan (1996, Am. Stat. 50:361–365) call type 7, R's and spreadsheets' default, so
 * the cut points match what an owner gets from QUARTILE.INC on the exported column. Null for no values.
 */
export function quartileCuts(values: readonly number[]): [number, number, number] | null {
  if (values.length === 0) return null;
  if (!values.every(Number.isFinite)) throw new Error('quartileCuts needs finite numbers');
  const sorted = [...values].sort((a, b) => a - b);
  const at = (p: number) => {
    const position = (sorted.length - 1) * p;
    const below = Math.floor(position);
    const fraction = position - below;
    return fraction === 0 ? sorted[below] : sorted[below] + fraction * (sorted[below + 1] - sorted[below]);
  };
  return [at(0.25), at(0.5), at(0.75)];
}

export const QUARTILE_KEYS = ['q1', 'q2', 'q3', 'q4'] as const;
export type QuartileKey = (typeof QUARTILE_KEYS)[number];

/** Upper cut points belong to the lower quartile, so ties at a cut point stay together. */
export function quartileOf(value: number, cuts: readonly [number, number, number]): QuartileKey {
  if (value <= cuts[0]) return 'q1';
  if (value <= cuts[1]) return 'q2';
  if (value <= cuts[2]) return 'q3';
  return 'q4';
}
