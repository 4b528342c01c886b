// Exposure budget: the degree-hours a batch has spent outside its band since it went into storage, against a limit.
import { batchExposure } from './batchExposure';
import type { BatchSnapshot, FindingDetail } from './types';

export interface BudgetVerdict {
  holds: boolean;
  detail: FindingDetail;
}

/** Below- and above-band degree-hours add up: both are harm the grafts took. Null when nothing was ever watched. */
export function judgeBudgetAt(batch: BatchSnapshot, t: number, budgetDegreeHours: number): BudgetVerdict | null {
  const exposure = batchExposure(batch.stays, { band: batch.band, freezeC: batch.freezeC, from: -Infinity, to: t });
  if (!exposure) return null;
  const degreeHours = exposure.below.degreeHours + exposure.above.degreeHours;
  return { holds: degreeHours > budgetDegreeHours, detail: { band: batch.band, degreeHours, budgetDegreeHours } };
}
