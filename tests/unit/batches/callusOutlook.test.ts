// The full-callus estimate, worked by hand from the callus rate curve (rate 0 at base, 1 from optLow to optHigh,
// linear in between, 0 at upper) and the shared estimateFullCallus.
import { describe, expect, it } from 'vitest';
import { getSpeciesProfile } from '../../../shared/species/profiles';
import { chooseOutlook } from '../../../server/exposure/callusOutlook';

const H = 3_600_000;
const APPLE = getSpeciesProfile('apple')!; // base 0 °C, optimum 13–18 °C, 336 h at optimum
const progress = (pct: number) => ({ optimumEquivalentHours: (pct / 100) * 336, hoursAtOptimum: 336, progressPct: pct });
const mean = (loggerId: number, meanC: number | null) => ({ loggerId, from: 0, to: 72 * H, meanC });

describe('chooseOutlook', () => {
  it('at 6.5 °C (rate 6.5/13 = 0.5), half done: 168 h to go take 336 h from the newest reading', () => {
    const outlook = chooseOutlook({ open: true, progress: progress(50), profile: APPLE, means: [mean(1, 6.5)] });
    expect(outlook).toEqual({ status: 'estimated', fullCallusAt: 72 * H + 336 * H, basis: { loggerId: 1, from: 0, to: 72 * H, meanC: 6.5, rate: 0.5 } });
  });

  it('takes the slowest logger in the room, never an average', () => {
    const outlook = chooseOutlook({ open: true, progress: progress(50), profile: APPLE, means: [mean(1, 15), mean(2, 3.25), mean(3, null)] });
    expect(outlook.status === 'estimated' && outlook.basis).toMatchObject({ loggerId: 2, rate: 0.25 });
  });

  it('gives no date when the recent mean makes no callus, or there is nothing recent, or the batch left storage', () => {
    expect(chooseOutlook({ open: true, progress: progress(10), profile: APPLE, means: [mean(1, -1)] })).toMatchObject({ status: 'none', reason: 'rate_zero' });
    expect(chooseOutlook({ open: true, progress: progress(10), profile: APPLE, means: [] })).toMatchObject({ status: 'none', reason: 'no_recent_readings' });
    expect(chooseOutlook({ open: false, progress: progress(10), profile: APPLE, means: [mean(1, 15)] })).toMatchObject({ status: 'none', reason: 'not_in_storage' });
  });

  it('says complete at 100 % or more, whatever the room does now', () => {
    expect(chooseOutlook({ open: true, progress: progress(104), profile: APPLE, means: [mean(1, -5)] })).toEqual({ status: 'complete' });
  });
});
