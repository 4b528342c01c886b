// The Wilson score interval for a binomial proportion (Wilson, E.B. 1927, JASA 22:209–212): the set of
// proportions p that a two-sided score test at level α would not reject, given x successes in n trials.
// Unlike p̂ ± z·SE it never leaves [0, 1] and stays honest for small n and for proportions near 0 or 1,
// which is why take figures of small groups carry it.

/** Φ⁻¹(0.975): the two-sided 95 % normal quantile. */
export const Z_95 = 1.959963984540054;

export interface ProportionInterval {
  low: number;
  high: number;
}

/**
 * Null when there are no trials (no proportion to speak of). Throws on counts that are not whole numbers with
 * 0 ≤ successes ≤ trials, since a take count above the planted count is a data error, not a proportion.
 */
export function wilsonInterval(successes: number, trials: number, z = Z_95): ProportionInterval | null {
  if (!Number.isInteger(successes) || !Number.isInteger(trials) || successes < 0 || successes > trials) {
    throw new Error(`wilsonInterval needs whole counts with 0 ≤ successes ≤ trials (got ${successes} of ${trials})`);
  }
  if (!(z > 0 && Number.isFinite(z))) throw new Error(`z must be a positive finite number (got ${z})`);
  if (trials === 0) return null;
  const n = trials;
  const p = successes / n;
  const z2 = z * z;
  const denominator = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denominator;
  const halfWidth = (z / denominator) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  // At x = 0 and x = n the exact bounds are 0 and 1; rounding in centre − halfWidth would leave ±1e-17 there.
  return {
    low: successes === 0 ? 0 : Math.max(0, centre - halfWidth),
    high: successes === n ? 1 : Math.min(1, centre + halfWidth),
  };
}
