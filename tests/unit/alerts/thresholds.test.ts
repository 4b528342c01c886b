import { describe, expect, it } from 'vitest';
import { DEFAULT_THRESHOLDS, nurseryThresholds, thresholdsFor } from '../../../shared/alerts/thresholds';
import { nurseryThresholdsPatch, roomThresholdsPatch } from '../../../shared/schemas/alerts';

describe('thresholds', () => {
  it('defaults are the brief\'s: 15 min hold, 6 h trend, 12 h look-ahead, 6 h out of band, 26 h silence, 12 h reminder', () => {
    expect(DEFAULT_THRESHOLDS).toMatchObject({
      holdMinutes: 15, freezeTrendHours: 6, freezeLookaheadHours: 12, outOfBandHours: 6, silentHours: 26, reminderHours: 12,
    });
  });

  it('a room override wins over the nursery, which wins over the default; other rooms keep the nursery value', () => {
    const overrides = { nursery: { holdMinutes: 30, silentHours: 48 }, rooms: new Map([[7, { holdMinutes: 5 }]]) };
    expect(thresholdsFor(overrides, 7)).toMatchObject({ holdMinutes: 5, silentHours: 48, reminderHours: 12 });
    expect(thresholdsFor(overrides, 8)).toMatchObject({ holdMinutes: 30, silentHours: 48 });
    expect(nurseryThresholds(overrides).holdMinutes).toBe(30);
  });

  it('an explicit null budget in a room switches the rule off there even when the nursery set one', () => {
    const overrides = { nursery: { exposureBudgetDegreeHours: 40 }, rooms: new Map([[3, { exposureBudgetDegreeHours: null }]]) };
    expect(thresholdsFor(overrides, 3).exposureBudgetDegreeHours).toBeNull();
    expect(thresholdsFor(overrides, 4).exposureBudgetDegreeHours).toBe(40);
  });

  it('changes refuse unknown keys and out-of-range values, and a room cannot set or reset the digest hour', () => {
    expect(nurseryThresholdsPatch.parse({ set: { holdMinutes: 20, digestHour: 6 } })).toEqual({ set: { holdMinutes: 20, digestHour: 6 }, reset: [] });
    expect(nurseryThresholdsPatch.safeParse({ reset: ['silentHours'] }).success).toBe(true);
    expect(roomThresholdsPatch.safeParse({ set: { digestHour: 6 } }).success).toBe(false);
    expect(roomThresholdsPatch.safeParse({ reset: ['digestHour'] }).success).toBe(false);
    expect(nurseryThresholdsPatch.safeParse({ set: { holdMinutes: -1 } }).success).toBe(false);
    expect(nurseryThresholdsPatch.safeParse({ set: { colour: 'red' } }).success).toBe(false);
  });
});
