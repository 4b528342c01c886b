// One pass over time-ordered readings, O(1) memory: the exposure of a joined line inside a clip window.
import { createCallusIntegrator, describeCallusModelProblem, type CallusIntegrator } from './callusRate';
import { LimitTally } from './limitTally';
import type { Exposure, ExposureOptions, Reading } from './types';

const MS_PER_HOUR = 3_600_000;
const MS_PER_MINUTE = 60_000;
export const DEFAULT_MAX_GAP_MINUTES = 180;

export interface ExposureAccumulator {
  /** Feed readings in time order (equal instants allowed); throws on an earlier instant or a non-number. */
  push(t: number, c: number): void;
  /** The figures so far; may be called at any point and again after more pushes. */
  result(): Exposure;
}

function checkOptions(opts: ExposureOptions): void {
  const { band, freezeC, maxGapMinutes, from, to, callus } = opts;
  if (!Number.isFinite(band.minC) || !Number.isFinite(band.maxC)) throw new Error('band limits must be finite numbers');
  if (band.minC > band.maxC) throw new Error(`band minimum ${band.minC} °C is above its maximum ${band.maxC} °C`);
  if (!Number.isFinite(freezeC)) throw new Error('freezeC must be a finite number');
  if (maxGapMinutes !== undefined && !(maxGapMinutes >= 0 && Number.isFinite(maxGapMinutes))) {
    throw new Error(`maxGapMinutes must be a finite number ≥ 0 (got ${maxGapMinutes})`);
  }
  if (from !== undefined && !Number.isFinite(from)) throw new Error('from must be a finite epoch-ms instant');
  if (to !== undefined && !Number.isFinite(to)) throw new Error('to must be a finite epoch-ms instant');
  if (from !== undefined && to !== undefined && from > to) throw new Error(`clip window starts (${from}) after it ends (${to})`);
  const callusProblem = callus ? describeCallusModelProblem(callus) : null;
  if (callusProblem) throw new Error(callusProblem);
}

/**
 * Consecutive readings at most maxGapMinutes apart are joined by a straight line; wider gaps are missing time.
 * The line is clipped to [from, to], interpolating at the clip instant when the reading pair around it is
 * joined. minC/maxC cover the readings inside the window and the line's values at the clip instants.
 * hoursMissing is measured over [from ?? first reading, to ?? last reading], so with a window given the
 * time before the first and after the last reading in it counts as missing.
 */
export function createExposureAccumulator(opts: ExposureOptions): ExposureAccumulator {
  checkOptions(opts);
  const maxGapMs = (opts.maxGapMinutes ?? DEFAULT_MAX_GAP_MINUTES) * MS_PER_MINUTE;
  const from = opts.from ?? -Infinity;
  const to = opts.to ?? Infinity;
  const below = new LimitTally(opts.band.minC, 'below');
  const above = new LimitTally(opts.band.maxC, 'above');
  const freeze = new LimitTally(opts.freezeC, 'below');
  const callusModel = opts.callus;
  const callus: CallusIntegrator | null = callusModel ? createCallusIntegrator(callusModel) : null;

  let coveredMs = 0;
  let integralCH = 0;
  let optimumEquivalentHours = 0;
  let minC = Infinity;
  let maxC = -Infinity;
  let firstT = NaN;
  let lastT = NaN;
  let prevT = NaN;
  let prevC = NaN;

  function noteValue(c: number): void {
    if (c < minC) minC = c;
    if (c > maxC) maxC = c;
  }

  function addPiece(startT: number, startC: number, endT: number, endC: number): void {
    const ms = endT - startT;
    const h = ms / MS_PER_HOUR;
    coveredMs += ms;
    integralCH += (h * (startC + endC)) / 2;
    below.addPiece(startC, endC, h);
    above.addPiece(startC, endC, h);
    freeze.addPiece(startC, endC, h);
    if (callus) optimumEquivalentHours += callus.integratePiece(startC, endC, h);
  }

  function addJoined(t0: number, c0: number, t1: number, c1: number): void {
    const startT = Math.max(t0, from);
    const endT = Math.min(t1, to);
    if (endT <= startT) return;
    const rise = c1 - c0;
    const duration = t1 - t0;
    let startC = c0;
    let endC = c1;
    if (startT > t0) {
      startC = c0 + rise * ((startT - t0) / duration);
      noteValue(startC);
    }
    if (endT < t1) {
      endC = c0 + rise * ((endT - t0) / duration);
      noteValue(endC);
    }
    addPiece(startT, startC, endT, endC);
  }

  return {
    push(t, c) {
      if (!Number.isFinite(t) || !Number.isFinite(c)) throw new Error(`reading (${t}, ${c}) is not a pair of finite numbers`);
      if (t < prevT) throw new Error(`readings out of time order: ${t} after ${prevT}`);
      if (t >= from && t <= to) {
        noteValue(c);
        if (Number.isNaN(firstT)) firstT = t;
        lastT = t;
      }
      if (t - prevT <= maxGapMs) addJoined(prevT, prevC, t, c);
      prevT = t;
      prevC = c;
    },

    result() {
      const spanStart = opts.from ?? firstT;
      const spanEnd = opts.to ?? lastT;
      const spanMs = Number.isNaN(spanStart) || Number.isNaN(spanEnd) ? coveredMs : spanEnd - spanStart;
      const hoursCovered = coveredMs / MS_PER_HOUR;
      const seen = minC <= maxC;
      const exposure: Exposure = {
        hoursCovered,
        hoursMissing: (spanMs - coveredMs) / MS_PER_HOUR,
        minC: seen ? minC : null,
        maxC: seen ? maxC : null,
        meanC: coveredMs > 0 ? integralCH / hoursCovered : null,
        below: below.toLimitExposure(),
        above: above.toLimitExposure(),
        freeze: freeze.toLimitExposure(),
        integralCH,
      };
      if (callusModel) {
        exposure.callus = {
          optimumEquivalentHours,
          hoursAtOptimum: callusModel.hoursAtOptimum,
          progressPct: (100 * optimumEquivalentHours) / callusModel.hoursAtOptimum,
        };
      }
      return exposure;
    },
  };
}

/** The accumulator run over a whole series (array or any iterable, e.g. rows streamed from the database). */
export function computeExposure(readings: Iterable<Reading>, opts: ExposureOptions): Exposure {
  const accumulator = createExposureAccumulator(opts);
  for (const r of readings) accumulator.push(r.t, r.c);
  return accumulator.result();
}
