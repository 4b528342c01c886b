// A batch's figures from its plan and the computed windows: per logger, per placement, headline, callus outlook.
import { computeExposure, sumExposures, worstOf, type Exposure } from '../../shared/exposure';
import type { SpeciesProfile } from '../../shared/species/schema';
import type { BatchPlan, Demand } from './batchPlan';
import { chooseOutlook, type CallusOutlook } from './callusOutlook';
import { engineKey, engineOptions } from './engineOptions';
import type { Span } from './spans';

const HOUR = 3_600_000;

export interface LoggerFigures {
  loggerId: number;
  /** The parts of the placement this logger watched. */
  spans: Span[];
  exposure: Exposure;
  /** Its last span ends where the placement's figures end (so it grows with an open placement). */
  reachesEnd: boolean;
}

export interface PlacementFigures {
  placementId: number;
  roomId: number;
  from: number;
  to: number | null;
  until: number;
  /** Per piece the worst of the loggers watching, summed over the pieces; unwatched time counts as missing. */
  exposure: Exposure;
  loggers: LoggerFigures[];
  unwatchedHours: number;
  endsUnwatched: boolean;
}

export interface BatchFigures {
  computedAt: number;
  open: boolean;
  profileKey: string;
  /** Null only when no placement has started yet. */
  exposure: Exposure | null;
  placements: PlacementFigures[];
  outlook: CallusOutlook;
}

/** No logger in the room: all of it is missing time, with the profile's limits so it sums with the rest. */
const unwatched = (profile: SpeciesProfile, span: Span) => computeExposure([], { ...engineOptions(profile), ...span });

type Lookup = (demand: Demand) => Exposure;

function placementFigures(plan: BatchPlan, p: BatchPlan['placements'][number], lookup: Lookup): PlacementFigures {
  const optionsKey = engineKey(plan.profile);
  const heads: Exposure[] = [];
  const byLogger = new Map<number, { spans: Span[]; parts: Exposure[] }>();
  let unwatchedMs = 0;
  for (const piece of p.pieces) {
    const span = { from: piece.from, to: piece.to };
    if (piece.loggerIds.length === 0) {
      unwatchedMs += piece.to - piece.from;
      heads.push(unwatched(plan.profile, span));
      continue;
    }
    const seen = piece.loggerIds.map((loggerId) => {
      const exposure = lookup({ loggerId, optionsKey, ...span });
      const entry = byLogger.get(loggerId) ?? { spans: [], parts: [] };
      const lastSpan = entry.spans.at(-1);
      if (lastSpan && lastSpan.to === span.from) lastSpan.to = span.to;
      else entry.spans.push({ ...span });
      entry.parts.push(exposure);
      byLogger.set(loggerId, entry);
      return exposure;
    });
    heads.push(seen.length === 1 ? seen[0] : worstOf(seen));
  }
  const lastPiece = p.pieces.at(-1);
  return {
    placementId: p.id,
    roomId: p.roomId,
    from: p.from,
    to: p.to,
    until: p.until,
    exposure: sumExposures(heads),
    loggers: [...byLogger].map(([loggerId, { spans, parts }]) => ({
      loggerId,
      spans,
      exposure: sumExposures(parts),
      reachesEnd: spans.at(-1)!.to === p.until,
    })),
    unwatchedHours: unwatchedMs / HOUR,
    endsUnwatched: lastPiece !== undefined && lastPiece.loggerIds.length === 0,
  };
}

/** Assembles the figures once every demand of the plan has been computed; `lookup` answers each demand. */
export function assembleFigures(plan: BatchPlan, lookup: Lookup, computedAt: number): BatchFigures {
  const placements = plan.placements.map((p) => placementFigures(plan, p, lookup));
  const exposure = placements.length ? sumExposures(placements.map((p) => p.exposure)) : null;
  const optionsKey = engineKey(plan.profile);
  const means = plan.outlook.map((w) => ({ ...w, meanC: lookup({ loggerId: w.loggerId, optionsKey, from: w.from, to: w.to }).meanC }));
  const outlook = chooseOutlook({ open: plan.open, progress: exposure?.callus ?? null, profile: plan.profile, means });
  return { computedAt, open: plan.open, profileKey: plan.profile.key, exposure, placements, outlook };
}

const later = (e: Exposure, hours: number): Exposure => ({ ...e, hoursMissing: e.hoursMissing + hours });

/**
 * Figures computed at `computedAt` brought forward to `now` without recomputing. Valid while no reading arrives
 * after `computedAt` (a new import changes the cache stamp): the open placement's end then moves on through time
 * with no reading in it, which is missing time and nothing else.
 */
export function advanceFigures(figures: BatchFigures, now: number): BatchFigures {
  const hours = (now - figures.computedAt) / HOUR;
  if (!figures.open || hours <= 0) return figures;
  const placements = figures.placements.map((p, i) => {
    if (i !== figures.placements.length - 1 || p.to !== null) return p;
    return {
      ...p,
      until: now,
      exposure: later(p.exposure, hours),
      loggers: p.loggers.map((l) => (l.reachesEnd ? { ...l, spans: l.spans.map((s, j) => (j === l.spans.length - 1 ? { ...s, to: now } : s)), exposure: later(l.exposure, hours) } : l)),
      unwatchedHours: p.endsUnwatched ? p.unwatchedHours + hours : p.unwatchedHours,
    };
  });
  return { ...figures, exposure: figures.exposure && later(figures.exposure, hours), placements };
}
