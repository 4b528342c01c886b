// How long a condition has held, judged at the instants readings were taken.

export interface HeldState {
  holds: boolean;
  /** The oldest judged instant of the unbroken run that ends at the newest instant. */
  since: number;
  asOf: number;
}

/**
 * Walks the instants (ascending) back from the newest while the condition keeps the value it has at the newest.
 * With `monotone` (a condition that, once true, stays true as time goes on — a running total past a limit) the
 * start of the run is found by bisection instead, since each judgement may cost a pass over a long history.
 * Null when there is no instant to judge.
 */
export function heldState(instants: readonly number[], judge: (t: number) => boolean, options: { monotone?: boolean } = {}): HeldState | null {
  const n = instants.length;
  if (n === 0) return null;
  const asOf = instants[n - 1];
  const holds = judge(asOf);
  // A monotone condition false now was false at every earlier instant too.
  if (options.monotone && !holds) return { holds, since: instants[0], asOf };
  if (options.monotone) {
    // Invariant: judge(instants[hi]) is true; everything before lo is false or unvisited.
    let lo = 0;
    let hi = n - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (judge(instants[mid])) hi = mid;
      else lo = mid + 1;
    }
    return { holds, since: instants[hi], asOf };
  }
  let start = n - 1;
  while (start > 0 && judge(instants[start - 1]) === holds) start--;
  return { holds, since: instants[start], asOf };
}

/** Settled when the current value has lasted the hold time; otherwise a change might still be a stray reading. */
export function isSettled(state: HeldState, holdMs: number): boolean {
  return state.asOf - state.since >= holdMs;
}
