// Shapes shared by the exposure engine: its input readings, its options and its results.
import type { TemperatureBand } from '../units';
import type { CallusModel } from './callusRate';

/** One logger reading: instant in epoch milliseconds (UTC) and temperature in °C. */
export interface Reading {
  t: number;
  c: number;
}

/** Time the joined line spends beyond one limit, and the area between line and limit there. */
export interface LimitExposure {
  limitC: number;
  hours: number;
  degreeHours: number;
}

export interface CallusProgress {
  /** ∫ rate dt over covered time: the hours at optimum that the temperatures seen are worth. */
  optimumEquivalentHours: number;
  hoursAtOptimum: number;
  /** 100 × optimumEquivalentHours / hoursAtOptimum; may exceed 100, callers cap for display. */
  progressPct: number;
}

/** The figures reported for one logger, room or batch (`coldknit check --json` prints exactly these). */
export interface ExposureReport {
  hoursCovered: number;
  hoursMissing: number;
  minC: number | null;
  maxC: number | null;
  /** ∫T dt / hoursCovered; null while nothing is covered. */
  meanC: number | null;
  below: LimitExposure;
  above: LimitExposure;
  freeze: LimitExposure;
  /** Present only when a callus model was given. */
  callus?: CallusProgress;
}

/**
 * A report plus the running integral it was derived from, so that sums over placements keep meanC exact
 * (sum the integrals and the covered hours, divide once) instead of re-weighting rounded means.
 */
export interface Exposure extends ExposureReport {
  /** ∫T dt over covered time, in °C·h. */
  integralCH: number;
}

export interface ExposureOptions {
  band: TemperatureBand;
  freezeC: number;
  /** Readings at most this far apart (inclusive) are joined by a straight line. Default 180. */
  maxGapMinutes?: number;
  /** Clip window in epoch ms: only the joined line inside [from, to] counts. */
  from?: number;
  to?: number;
  callus?: CallusModel;
}
