// When a batch should reach full callus if its room keeps the mean of its last 72 hours of readings.
import { callusRate, estimateFullCallus, type CallusProgress } from '../../shared/exposure';
import type { SpeciesProfile } from '../../shared/species/schema';
import type { OutlookWindow } from './batchPlan';

export interface OutlookBasis {
  loggerId: number;
  from: number;
  to: number;
  meanC: number;
  /** Hours at optimum gained per hour at meanC (0…1). */
  rate: number;
}

export type CallusOutlook =
  | { status: 'complete' }
  | { status: 'estimated'; fullCallusAt: number; basis: OutlookBasis }
  | { status: 'none'; reason: 'not_in_storage' | 'no_recent_readings' | 'rate_zero'; basis: OutlookBasis | null };

interface OutlookInput {
  open: boolean;
  progress: CallusProgress | null;
  profile: SpeciesProfile;
  means: (OutlookWindow & { meanC: number | null })[];
}

/**
 * Of the loggers now in the batch's room, the one whose recent mean gives the slowest callus rate decides (a batch
 * is ready when its slowest corner is, as in worstOf). The estimate runs from that logger's newest reading: progress
 * is known up to there, and the mean is assumed to hold from then on.
 */
export function chooseOutlook({ open, progress, profile, means }: OutlookInput): CallusOutlook {
  if (progress && progress.progressPct >= 100) return { status: 'complete' };
  if (!open || !progress) return { status: 'none', reason: 'not_in_storage', basis: null };
  let basis: OutlookBasis | null = null;
  for (const m of means) {
    if (m.meanC === null) continue;
    const rate = callusRate(profile.callus, m.meanC);
    if (basis === null || rate < basis.rate) basis = { loggerId: m.loggerId, from: m.from, to: m.to, meanC: m.meanC, rate };
  }
  if (basis === null) return { status: 'none', reason: 'no_recent_readings', basis: null };
  const fullCallusAt = estimateFullCallus({
    progressPct: progress.progressPct,
    hoursAtOptimum: progress.hoursAtOptimum,
    meanLast72hC: basis.meanC,
    model: profile.callus,
    now: basis.to,
  });
  return fullCallusAt === null ? { status: 'none', reason: 'rate_zero', basis } : { status: 'estimated', fullCallusAt, basis };
}
