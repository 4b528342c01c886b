// Freeze risk in a room: a reading at or below the strictest freeze limit, or a falling trend that gets there soon.
import { linearTrend, timeToReach } from '../exposure/trend';
import { freshReadingAt } from './freshness';
import { readingsWithin } from './series';
import type { FindingDetail, LoggerSeries } from './types';
import type { Severity } from './rules';

const MS_PER_HOUR = 3_600_000;

/**
 * A trend needs at least three readings spanning an hour [DESIGN]: two readings always fit a line exactly, and
 * a line over a few minutes turns one noisy reading into a steep slope.
 */
const MIN_TREND_READINGS = 3;
const MIN_TREND_SPAN_MS = MS_PER_HOUR;

export interface FreezeParams {
  limitC: number;
  trendHours: number;
  lookaheadHours: number;
}

export interface FreezeVerdict {
  holds: boolean;
  severity: Severity;
  detail: FindingDetail;
}

interface LoggerVerdict extends FreezeVerdict {
  /** For picking the logger that speaks for the room: lower is worse. */
  rank: number;
}

function judgeLogger(series: LoggerSeries, t: number, p: FreezeParams): LoggerVerdict | null {
  const now = freshReadingAt(series.readings, t);
  if (!now) return null;
  const recent = readingsWithin(series.readings, t - p.trendHours * MS_PER_HOUR, t);
  const trend =
    recent.length >= MIN_TREND_READINGS && recent[recent.length - 1].t - recent[0].t >= MIN_TREND_SPAN_MS ? linearTrend(recent) : null;
  let reachesAt: number | null = null;
  if (trend && trend.slopeCPerHour < 0) {
    // A falling line already at or under the limit "reaches" it now; timeToReach answers null for that case.
    reachesAt = trend.interceptAt(t) <= p.limitC ? t : timeToReach(p.limitC, trend, t);
  }
  const atOrBelow = now.c <= p.limitC;
  const forecast = reachesAt !== null && reachesAt <= t + p.lookaheadHours * MS_PER_HOUR;
  const detail: FindingDetail = {
    valueC: now.c,
    readingAt: now.t,
    loggerLabel: series.label,
    limitC: p.limitC,
    trendCPerHour: trend ? trend.slopeCPerHour : null,
    windowHours: p.trendHours,
    reachesAt: forecast ? reachesAt : null,
    cause: atOrBelow ? 'at_or_below' : forecast ? 'trend' : undefined,
  };
  // Readings at the limit outrank forecasts; among forecasts the sooner one is worse.
  const rank = atOrBelow ? now.c - 1e9 : forecast ? reachesAt! : Infinity;
  return { holds: atOrBelow || forecast, severity: atOrBelow ? 'critical' : 'warning', detail, rank };
}

/** The room's verdict at t: the worst of its loggers with a fresh reading; null when none has one. */
export function judgeFreezeAt(loggers: readonly LoggerSeries[], t: number, p: FreezeParams): FreezeVerdict | null {
  let worst: LoggerVerdict | null = null;
  for (const series of loggers) {
    const verdict = judgeLogger(series, t, p);
    if (!verdict) continue;
    if (!worst || verdict.rank < worst.rank || (verdict.rank === worst.rank && (verdict.detail.valueC ?? 0) < (worst.detail.valueC ?? 0))) {
      worst = verdict;
    }
  }
  if (!worst) return null;
  const { rank: _rank, ...verdict } = worst;
  return verdict;
}
