// The run a condition has been in: linear walk back, and bisection for monotone conditions checked against the walk.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { heldState, isSettled } from '../../../shared/alerts/heldState';

const MIN = 60_000;
const every10 = (n: number) => Array.from({ length: n }, (_, i) => i * 10 * MIN);

describe('heldState', () => {
  it('one stray cold reading at the end is a run of zero length, not settled under a 15 min hold', () => {
    const instants = every10(6);
    const state = heldState(instants, (t) => t === instants[5])!;
    expect(state).toEqual({ holds: true, since: instants[5], asOf: instants[5] });
    expect(isSettled(state, 15 * MIN)).toBe(false);
  });

  it('three readings 10 min apart span 20 min and settle a 15 min hold', () => {
    const instants = every10(6);
    const state = heldState(instants, (t) => t >= instants[3])!;
    expect(state.since).toBe(instants[3]);
    expect(isSettled(state, 15 * MIN)).toBe(true);
  });

  it('a clear run is traced the same way, so a recovery must also last the hold before it counts', () => {
    const instants = every10(6);
    const state = heldState(instants, (t) => t < instants[5])!;
    expect(state.holds).toBe(false);
    expect(isSettled(state, 15 * MIN)).toBe(false);
  });

  it('null without instants', () => {
    expect(heldState([], () => true)).toBeNull();
  });

  it('bisection on a monotone condition finds the same run start as walking back (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 300 }), fc.integer({ min: 0, max: 310 }), (n, crossing) => {
        const instants = every10(n);
        const judge = (t: number) => t >= crossing * 10 * MIN;
        let calls = 0;
        const counted = (t: number) => (calls++, judge(t));
        expect(heldState(instants, counted, { monotone: true })).toEqual(heldState(instants, judge));
        // Bisection: about log2(n) judgements plus the newest, never a walk over all of them.
        expect(calls).toBeLessThanOrEqual(Math.ceil(Math.log2(n)) + 2);
      }),
    );
  });
});
