// Outside the band: a batch spent more than the allowed hours below or above its band in the trailing window.
import { batchExposure } from './batchExposure';
import type { BatchSnapshot, FindingDetail } from './types';

const MS_PER_HOUR = 3_600_000;

export interface BandVerdict {
  holds: boolean;
  detail: FindingDetail;
}

/** Null when no logger watched the batch during the window. "More than" is strict: exactly the allowance is fine. */
export function judgeBandAt(batch: BatchSnapshot, t: number, windowHours: number, allowedHours: number): BandVerdict | null {
  const exposure = batchExposure(batch.stays, { band: batch.band, freezeC: batch.freezeC, from: t - windowHours * MS_PER_HOUR, to: t });
  if (!exposure) return null;
  return {
    holds: exposure.below.hours > allowedHours || exposure.above.hours > allowedHours,
    detail: {
      band: batch.band,
      hoursBelow: exposure.below.hours,
      hoursAbove: exposure.above.hours,
      windowHours,
      allowedHours,
      valueC: null,
    },
  };
}
