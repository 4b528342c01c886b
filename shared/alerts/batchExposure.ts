// A batch's exposure over a window, from the rooms it stayed in: worst logger per stay, stays added up.
import { computeExposure } from '../exposure/accumulator';
import { sumExposures, worstOf } from '../exposure/combine';
import type { Exposure } from '../exposure/types';
import type { TemperatureBand } from '../units';
import { readingsAround } from './series';
import type { BatchStay } from './types';

export interface BatchWindow {
  band: TemperatureBand;
  freezeC: number;
  /** Epoch ms; -Infinity for the batch's whole stay so far. */
  from: number;
  to: number;
}

/** Null when no logger watched the batch at any time inside the window. */
export function batchExposure(stays: readonly BatchStay[], window: BatchWindow): Exposure | null {
  const pieces: Exposure[] = [];
  for (const stay of stays) {
    const stayFrom = Math.max(stay.from, window.from);
    const stayTo = Math.min(stay.to ?? Infinity, window.to);
    if (!(stayTo > stayFrom)) continue;
    const perLogger: Exposure[] = [];
    for (const logger of stay.loggers) {
      const from = Math.max(stayFrom, logger.from);
      const to = Math.min(stayTo, logger.to ?? Infinity);
      if (!(to > from)) continue;
      const readings = readingsAround(logger.readings, from, to);
      perLogger.push(computeExposure(readings, { band: window.band, freezeC: window.freezeC, from, to }));
    }
    if (perLogger.length) pieces.push(worstOf(perLogger));
  }
  return pieces.length ? sumExposures(pieces) : null;
}
