// Combining exposures: summed over a batch's placements, or the worst of several loggers in one room.
import type { CallusProgress, Exposure, LimitExposure } from './types';

type LimitKey = 'below' | 'above' | 'freeze';
const LIMIT_KEYS: readonly LimitKey[] = ['below', 'above', 'freeze'];

function checkCombinable(list: readonly Exposure[], what: string): void {
  if (list.length === 0) throw new Error(`${what} needs at least one exposure`);
  const [first] = list;
  for (const e of list) {
    for (const key of LIMIT_KEYS) {
      if (e[key].limitC !== first[key].limitC) {
        throw new Error(`${what}: ${key} limits differ (${first[key].limitC} °C and ${e[key].limitC} °C)`);
      }
    }
    if ((e.callus === undefined) !== (first.callus === undefined)) {
      throw new Error(`${what}: some exposures carry callus progress and others do not`);
    }
    if (e.callus && first.callus && e.callus.hoursAtOptimum !== first.callus.hoursAtOptimum) {
      throw new Error(`${what}: callus models differ (${first.callus.hoursAtOptimum} h and ${e.callus.hoursAtOptimum} h at optimum)`);
    }
  }
}

function callusProgress(optimumEquivalentHours: number, hoursAtOptimum: number): CallusProgress {
  return { optimumEquivalentHours, hoursAtOptimum, progressPct: (100 * optimumEquivalentHours) / hoursAtOptimum };
}

function extreme(values: readonly (number | null)[], pick: (a: number, b: number) => number): number | null {
  let result: number | null = null;
  for (const v of values) if (v !== null) result = result === null ? v : pick(result, v);
  return result;
}

function combineLimit(list: readonly Exposure[], key: LimitKey, merge: (a: number, b: number) => number): LimitExposure {
  return {
    limitC: list[0][key].limitC,
    hours: list.map((e) => e[key].hours).reduce(merge),
    degreeHours: list.map((e) => e[key].degreeHours).reduce(merge),
  };
}

const add = (a: number, b: number) => a + b;
// Wrapped: Array.reduce would pass the index and array to Math.max as extra arguments.
const larger = (a: number, b: number) => Math.max(a, b);

/**
 * Exposure of consecutive, non-overlapping pieces (a batch's placements, or one series cut in parts): hours,
 * degree-hours, ∫T dt and callus thermal time add up; meanC is recomputed from the summed integral.
 */
export function sumExposures(list: readonly Exposure[]): Exposure {
  checkCombinable(list, 'sumExposures');
  const hoursCovered = list.map((e) => e.hoursCovered).reduce(add);
  const integralCH = list.map((e) => e.integralCH).reduce(add);
  const sum: Exposure = {
    hoursCovered,
    hoursMissing: list.map((e) => e.hoursMissing).reduce(add),
    minC: extreme(list.map((e) => e.minC), Math.min),
    maxC: extreme(list.map((e) => e.maxC), Math.max),
    meanC: hoursCovered > 0 ? integralCH / hoursCovered : null,
    below: combineLimit(list, 'below', add),
    above: combineLimit(list, 'above', add),
    freeze: combineLimit(list, 'freeze', add),
    integralCH,
  };
  const first = list[0].callus;
  if (first) {
    const equivalent = list.map((e) => e.callus?.optimumEquivalentHours ?? 0).reduce(add);
    sum.callus = callusProgress(equivalent, first.hoursAtOptimum);
  }
  return sum;
}

/**
 * Headline for several loggers watching one room over the same time: each risk figure is the worst any logger
 * saw, taken metric by metric (a cold corner is never averaged away), so the result may mix loggers.
 * - below/above/freeze hours and degree-hours: the largest; minC the lowest; maxC the highest.
 * - hoursCovered, hoursMissing, meanC and integralCH are not risks: they come together from the logger with
 *   the most covered hours (the first such on a tie), so meanC stays that logger's ∫T/covered and the
 *   result can still be summed exactly with sumExposures.
 * - callus progress: the least advanced logger, because the batch is ready only when its slowest corner is.
 */
export function worstOf(list: readonly Exposure[]): Exposure {
  checkCombinable(list, 'worstOf');
  const bestObserved = list.reduce((best, e) => (e.hoursCovered > best.hoursCovered ? e : best));
  const worst: Exposure = {
    hoursCovered: bestObserved.hoursCovered,
    hoursMissing: bestObserved.hoursMissing,
    minC: extreme(list.map((e) => e.minC), Math.min),
    maxC: extreme(list.map((e) => e.maxC), Math.max),
    meanC: bestObserved.meanC,
    below: combineLimit(list, 'below', larger),
    above: combineLimit(list, 'above', larger),
    freeze: combineLimit(list, 'freeze', larger),
    integralCH: bestObserved.integralCH,
  };
  const first = list[0].callus;
  if (first) {
    const slowest = Math.min(...list.map((e) => e.callus?.optimumEquivalentHours ?? 0));
    worst.callus = callusProgress(slowest, first.hoursAtOptimum);
  }
  return worst;
}
