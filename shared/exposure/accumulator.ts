// One pass over time-ordered readings, O(1) memory: the exposure of a joined line inside a clip window.
import { createCallusIntegrator, describeCallusModelProblem, type CallusIntegrator, type CallusModel } from './callusRate';
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
  return new RunningExposure(opts);
}

/**
 * The running totals live in one object's fields rather than in closure variables: V8 boxes every write of
 * a number held in a closure into a fresh heap object, while an object's number fields are updated in place,
 * so a push allocates nothing.
 */
class RunningExposure implements ExposureAccumulator {
  private readonly maxGapMs: number;
  private readonly from: number;
  private readonly to: number;
  private readonly below: LimitTally;
  private readonly above: LimitTally;
  private readonly freeze: LimitTally;
  private readonly callusModel: CallusModel | undefined;
  private readonly callus: CallusIntegrator | null;
  private coveredMs = 0;
  private integralCH = 0;
  private optimumEquivalentHours = 0;
  private minC = Infinity;
  private maxC = -Infinity;
  private firstT = NaN;
  private lastT = NaN;
  private prevT = NaN;
  private prevC = NaN;

  constructor(private readonly opts: ExposureOptions) {
    this.maxGapMs = (opts.maxGapMinutes ?? DEFAULT_MAX_GAP_MINUTES) * MS_PER_MINUTE;
    this.from = opts.from ?? -Infinity;
    this.to = opts.to ?? Infinity;
    this.below = new LimitTally(opts.band.minC, 'below');
    this.above = new LimitTally(opts.band.maxC, 'above');
    this.freeze = new LimitTally(opts.freezeC, 'below');
    this.callusModel = opts.callus;
    this.callus = opts.callus ? createCallusIntegrator(opts.callus) : null;
  }

  push(t: number, c: number): void {
    if (!Number.isFinite(t) || !Number.isFinite(c)) throw new Error(`reading (${t}, ${c}) is not a pair of finite numbers`);
    const prevT = this.prevT;
    if (t < prevT) throw new Error(`readings out of time order: ${t} after ${prevT}`);
    if (t >= this.from && t <= this.to) {
      this.noteValue(c);
      if (Number.isNaN(this.firstT)) this.firstT = t;
      this.lastT = t;
    }
    if (t - prevT <= this.maxGapMs) this.addJoined(prevT, this.prevC, t, c);
    this.prevT = t;
    this.prevC = c;
  }

  result(): Exposure {
    const { opts, callusModel, coveredMs, minC, maxC, integralCH, optimumEquivalentHours } = this;
    const spanStart = opts.from ?? this.firstT;
    const spanEnd = opts.to ?? this.lastT;
    const spanMs = Number.isNaN(spanStart) || Number.isNaN(spanEnd) ? coveredMs : spanEnd - spanStart;
    const hoursCovered = coveredMs / MS_PER_HOUR;
    const seen = minC <= maxC;
    const exposure: Exposure = {
      hoursCovered,
      hoursMissing: (spanMs - coveredMs) / MS_PER_HOUR,
      minC: seen ? minC : null,
      maxC: seen ? maxC : null,
      meanC: coveredMs > 0 ? integralCH / hoursCovered : null,
      below: this.below.toLimitExposure(),
      above: this.above.toLimitExposure(),
      freeze: this.freeze.toLimitExposure(),
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
  }

  private noteValue(c: number): void {
    if (c < this.minC) this.minC = c;
    if (c > this.maxC) this.maxC = c;
  }

  private addJoined(t0: number, c0: number, t1: number, c1: number): void {
    const startT = Math.max(t0, this.from);
    const endT = Math.min(t1, this.to);
    if (endT <= startT) return;
    const rise = c1 - c0;
    const duration = t1 - t0;
    let startC = c0;
    let endC = c1;
    if (startT > t0) {
      startC = c0 + rise * ((startT - t0) / duration);
      this.noteValue(startC);
    }
    if (endT < t1) {
      endC = c0 + rise * ((endT - t0) / duration);
      this.noteValue(endC);
    }
    this.addPiece(startT, startC, endT, endC);
  }

  private addPiece(startT: number, startC: number, endT: number, endC: number): void {
    const ms = endT - startT;
    const h = ms / MS_PER_HOUR;
    this.coveredMs += ms;
    this.integralCH += (h * (startC + endC)) / 2;
    this.below.addPiece(startC, endC, h);
    this.above.addPiece(startC, endC, h);
    this.freeze.addPiece(startC, endC, h);
    if (this.callus) this.optimumEquivalentHours += this.callus.integratePiece(startC, endC, h);
  }
}

/** The accumulator run over a whole series (array or any iterable, e.g. rows streamed from the database). */
export function computeExposure(readings: Iterable<Reading>, opts: ExposureOptions): Exposure {
  const accumulator = createExposureAccumulator(opts);
  for (const r of readings) accumulator.push(r.t, r.c);
  return accumulator.result();
}
