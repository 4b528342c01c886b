// When a batch will reach full callus if the recent mean temperature holds.
import { callusRate, type CallusRateCurve } from './callusRate';

const MS_PER_HOUR = 3_600_000;

export interface FullCallusEstimateInput {
  progressPct: number;
  hoursAtOptimum: number;
  /** Mean temperature over the last 72 hours, taken as the temperature from now on. */
  meanLast72hC: number;
  model: CallusRateCurve;
  /** Epoch ms. */
  now: number;
}

/** Epoch ms of full callus; `now` when already complete; null when the rate at that mean is 0. */
export function estimateFullCallus(input: FullCallusEstimateInput): number | null {
  const { progressPct, hoursAtOptimum, meanLast72hC, model, now } = input;
  if (progressPct >= 100) return now;
  const rate = callusRate(model, meanLast72hC);
  if (rate === 0) return null;
  const hoursLeft = (((100 - progressPct) / 100) * hoursAtOptimum) / rate;
  return now + hoursLeft * MS_PER_HOUR;
}
