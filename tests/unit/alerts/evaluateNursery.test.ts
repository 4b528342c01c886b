// Every rule through evaluateNursery: fires after its hold, settles, clears, and says unknown on old data.
import { describe, expect, it } from 'vitest';
import { evaluateNursery } from '../../../shared/alerts/evaluateNursery';
import type { Finding } from '../../../shared/alerts/types';
import { apple, batchIn, HOUR, MIN, nursery, room, sampled, T0, walnut } from './fixtures';

const noOverrides = { nursery: {}, rooms: new Map() };
const pick = (findings: Finding[], rule: Finding['rule']) => findings.find((f) => f.rule === rule)!;

describe('freeze risk', () => {
  it('one stray reading at the limit settles nothing; three readings 20 min apart fire, critical', () => {
    const steady = sampled(T0, T0 + 6 * HOUR, () => 2);
    const stray = [...steady, { t: T0 + 6 * HOUR + 10 * MIN, c: -2.5 }];
    expect(pick(evaluateNursery(nursery(room(stray)), noOverrides, T0 + 7 * HOUR), 'freeze_risk').state).toBe('settling');
    const cold = [...steady, ...[10, 20, 30].map((m) => ({ t: T0 + 6 * HOUR + m * MIN, c: -2.5 }))];
    const f = pick(evaluateNursery(nursery(room(cold)), noOverrides, T0 + 7 * HOUR), 'freeze_risk');
    expect(f).toMatchObject({ state: 'firing', severity: 'critical', since: T0 + 6 * HOUR + 10 * MIN, detail: { cause: 'at_or_below' } });
    expect(f.detail.batches).toEqual([{ id: apple.batchId, code: apple.code, species: 'Apple', count: 240 }]);
  });

  it('the strictest freeze limit in the room is the highest one: −1 °C with a −2 °C species beside it', () => {
    const tender = { ...walnut, batchId: 13, freezeC: -1 };
    const readings = sampled(T0, T0 + HOUR, () => -1.5);
    expect(pick(evaluateNursery(nursery(room(readings, [apple, tender])), noOverrides, T0 + HOUR), 'freeze_risk')).toMatchObject({
      state: 'firing', detail: { limitC: -1 },
    });
  });

  it('a condition older than the 24 h horizon says its start is that far back "or earlier"', () => {
    const readings = sampled(T0, T0 + 30 * HOUR, () => -3);
    const f = pick(evaluateNursery(nursery(room(readings)), noOverrides, T0 + 30 * HOUR), 'freeze_risk');
    expect(f).toMatchObject({ state: 'firing', since: T0 + 6 * HOUR, detail: { sinceCapped: true } });
    const fresh = pick(evaluateNursery(nursery(room(readings.slice(0, 13))), noOverrides, T0 + 2 * HOUR), 'freeze_risk');
    expect(fresh.since).toBe(T0);
    expect(fresh.detail.sinceCapped).toBeUndefined();
  });

  it('clears once the room has been above the limit and off the falling trend for the hold time', () => {
    const readings = [...sampled(T0, T0 + HOUR, () => -3), ...sampled(T0 + 70 * MIN, T0 + 3 * HOUR, () => 4)];
    expect(pick(evaluateNursery(nursery(room(readings)), noOverrides, T0 + 3 * HOUR), 'freeze_risk').state).toBe('clear');
  });

  it('is unknown when the newest reading is older than the silence limit, and absent for an empty room', () => {
    const readings = sampled(T0, T0 + HOUR, () => -3);
    expect(pick(evaluateNursery(nursery(room(readings)), noOverrides, T0 + 28 * HOUR), 'freeze_risk').state).toBe('unknown');
    expect(evaluateNursery(nursery(room(readings, [])), noOverrides, T0 + HOUR)).toEqual([]);
  });
});

describe('too warm for cold storage', () => {
  it('fires after 120 min above the lowest storage limit, not after 110; never for warm-callused species', () => {
    const warmFrom = T0 + 2 * HOUR;
    const readings = sampled(T0, T0 + 5 * HOUR, (t) => (t >= warmFrom ? 11 : 5));
    const early = evaluateNursery(nursery(room(readings.filter((r) => r.t <= warmFrom + 110 * MIN))), noOverrides, warmFrom + 110 * MIN);
    expect(pick(early, 'storage_warm').state).toBe('settling');
    const later = evaluateNursery(nursery(room(readings.filter((r) => r.t <= warmFrom + 120 * MIN))), noOverrides, warmFrom + 120 * MIN);
    expect(pick(later, 'storage_warm')).toMatchObject({ state: 'firing', severity: 'warning', since: warmFrom, detail: { limitC: 10, valueC: 11 } });
    expect(pick(evaluateNursery(nursery(room(readings, [walnut])), noOverrides, T0 + 5 * HOUR), 'storage_warm')).toBeUndefined();
  });

  it('clears after the ordinary 15 min hold back under the limit, not after the 120 min it took to fire', () => {
    const readings = [...sampled(T0, T0 + 3 * HOUR, () => 11), ...sampled(T0 + 3 * HOUR + 10 * MIN, T0 + 3 * HOUR + 30 * MIN, () => 6)];
    expect(pick(evaluateNursery(nursery(room(readings)), noOverrides, T0 + 4 * HOUR), 'storage_warm')).toMatchObject({
      state: 'clear', since: T0 + 3 * HOUR + 10 * MIN,
    });
  });
});

describe('outside the band', () => {
  // Apple band 0–7.2 °C. Readings step from 1 °C to −1 °C; the joined line between them crosses 0 °C halfway, 5 min in.
  const below = (hours: number) => sampled(T0, T0 + 24 * HOUR, (t) => (t > T0 + (24 - hours) * HOUR ? -1 : 1));

  it('5½ h below in the last 24 h is within the 6 h allowance; about 7 h fires', () => {
    const within = below(5.5);
    const b1 = batchIn(within);
    const f1 = pick(evaluateNursery(nursery(room(within), [b1]), noOverrides, T0 + 24 * HOUR), 'out_of_band');
    expect(f1.state).toBe('clear');
    const over = below(7);
    const f2 = pick(evaluateNursery(nursery(room(over), [batchIn(over)]), noOverrides, T0 + 24 * HOUR), 'out_of_band');
    expect(f2.state).toBe('firing');
    // Below 0 from the crossing halfway between the 1 °C and −1 °C readings: 7 h less 5 min of the first piece.
    expect(f2.detail.hoursBelow).toBeCloseTo(7 - 5 / 60, 9);
    expect(f2.subjectKind).toBe('batch');
  });
});

describe('exposure budget', () => {
  it('off by default; with 20 °C·h allowed, 2 °C below the band for 10 h (20 °C·h) is not over, 11 h is', () => {
    // Degree-hours are the area between the line and the limit (REFERENCES §4b): 2 °C × 10 h = 20 °C·h.
    const series = (hours: number) => sampled(T0, T0 + hours * HOUR, () => -2);
    const evalFor = (hours: number, budget: number | null) =>
      evaluateNursery(nursery(room(series(hours)), [batchIn(series(hours))]), { nursery: { exposureBudgetDegreeHours: budget }, rooms: new Map() }, T0 + hours * HOUR);
    expect(pick(evalFor(10, null), 'exposure_budget')).toBeUndefined();
    const within = pick(evalFor(10, 20), 'exposure_budget');
    expect(within.state).toBe('clear');
    expect(within.detail.degreeHours).toBeCloseTo(20, 9);
    const over = pick(evalFor(11, 20), 'exposure_budget');
    expect(over.state).toBe('firing');
    expect(over.detail.degreeHours).toBeCloseTo(22, 9);
  });
});

describe('silent logger', () => {
  const logger = { loggerId: 5, label: 'G-5', roomId: 1, roomName: 'Test garage', placedFrom: T0 - 48 * HOUR, lastReadingAt: T0 };
  const judge = (now: number, lastReadingAt: number | null = T0) =>
    pick(evaluateNursery({ nurseryId: 1, rooms: [], batches: [], loggers: [{ ...logger, lastReadingAt }] }, noOverrides, now), 'silent_logger');

  it('silent after 26 h without a reading, from that moment; a reading newer than that clears it at once', () => {
    expect(judge(T0 + 26 * HOUR).state).toBe('clear');
    expect(judge(T0 + 26 * HOUR + 1)).toMatchObject({ state: 'firing', since: T0 + 26 * HOUR, subjectKind: 'logger' });
  });

  it('a logger that never reported counts from its placement', () => {
    expect(judge(T0 - 48 * HOUR + 27 * HOUR, null)).toMatchObject({ state: 'firing', since: T0 - 22 * HOUR });
  });
});
