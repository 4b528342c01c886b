// The callus rate curve (thermal time) and its exact integral along a straight piece of the joined line.

/** Rate 0 at or below baseC, rising linearly to 1 at optLowC, 1 up to optHighC, falling to 0 at upperC. */
export interface CallusRateCurve {
  baseC: number;
  optLowC: number;
  optHighC: number;
  upperC: number;
}

export interface CallusModel extends CallusRateCurve {
  /** Hours at a constant optimum temperature that bring a graft union to full callus. */
  hoursAtOptimum: number;
}

/** Why a curve cannot be used, or null when it is sound. Shared with the species-profile schema. */
export function describeCallusCurveProblem(curve: CallusRateCurve): string | null {
  const { baseC, optLowC, optHighC, upperC } = curve;
  if (![baseC, optLowC, optHighC, upperC].every(Number.isFinite)) return 'callus temperatures must be finite numbers';
  if (!(baseC < optLowC)) return `callus base ${baseC} °C must be below the optimum's low end ${optLowC} °C`;
  if (!(optLowC <= optHighC)) return `callus optimum low end ${optLowC} °C must not exceed its high end ${optHighC} °C`;
  if (!(optHighC < upperC)) return `callus optimum high end ${optHighC} °C must be below the upper limit ${upperC} °C`;
  return null;
}

export function describeCallusModelProblem(model: CallusModel): string | null {
  if (!(Number.isFinite(model.hoursAtOptimum) && model.hoursAtOptimum > 0)) {
    return `hoursAtOptimum must be a positive number (got ${model.hoursAtOptimum})`;
  }
  return describeCallusCurveProblem(model);
}

export function callusRate(curve: CallusRateCurve, c: number): number {
  if (c <= curve.baseC || c >= curve.upperC) return 0;
  if (c < curve.optLowC) return (c - curve.baseC) / (curve.optLowC - curve.baseC);
  if (c <= curve.optHighC) return 1;
  return (curve.upperC - c) / (curve.upperC - curve.optHighC);
}

export interface CallusIntegrator {
  /** ∫ rate dt, in hours, over a straight piece running from c0 to c1 for `h` hours. */
  integratePiece(c0: number, c1: number, h: number): number;
}

/**
 * T is linear in t on a piece and the rate is piecewise linear in T, so splitting the piece where T passes a
 * breakpoint leaves sub-pieces on which the rate is linear in t: the trapezoid rule is then exact.
 */
export function createCallusIntegrator(curve: CallusRateCurve): CallusIntegrator {
  return new PiecewiseCallusIntegrator(curve);
}

/**
 * Runs once per joined piece, so it keeps its own copy of the curve (callers pass objects of many shapes,
 * which would make every field read in callusRate a slow lookup) and walks its breakpoints by index.
 */
class PiecewiseCallusIntegrator implements CallusIntegrator, CallusRateCurve {
  readonly baseC: number;
  readonly optLowC: number;
  readonly optHighC: number;
  readonly upperC: number;
  private readonly rising: readonly number[];

  constructor(curve: CallusRateCurve) {
    this.baseC = curve.baseC;
    this.optLowC = curve.optLowC;
    this.optHighC = curve.optHighC;
    this.upperC = curve.upperC;
    this.rising = [curve.baseC, curve.optLowC, curve.optHighC, curve.upperC];
  }

  integratePiece(c0: number, c1: number, h: number): number {
    if (c0 === c1) return h * callusRate(this, c0);
    const span = c1 - c0;
    const last = this.rising.length - 1;
    let doneFraction = 0;
    let doneRate = callusRate(this, c0);
    let total = 0;
    for (let i = 0; i <= last; i++) {
      const breakpoint = this.rising[span > 0 ? i : last - i];
      const fraction = (breakpoint - c0) / span;
      if (fraction <= doneFraction || fraction >= 1) continue;
      const rate = callusRate(this, breakpoint);
      total += ((fraction - doneFraction) * (doneRate + rate)) / 2;
      doneFraction = fraction;
      doneRate = rate;
    }
    total += ((1 - doneFraction) * (doneRate + callusRate(this, c1))) / 2;
    return total * h;
  }
}
