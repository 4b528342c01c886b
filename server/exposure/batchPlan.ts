// What must be computed for a batch: its placements cut where room loggers change, and the windows each logger owes.
import type { SpeciesProfile } from '../../shared/species/schema';
import { engineKey } from './engineOptions';
import { overlap, splitByLoggers, type CoveredPiece, type LoggerStay, type Span } from './spans';

const HOUR = 3_600_000;
/** The callus outlook assumes the room keeps the mean temperature of this many hours up to its newest reading. */
export const OUTLOOK_HOURS = 72;

export interface BatchStay {
  id: number;
  roomId: number;
  from: number;
  to: number | null;
}

export interface BatchToPlan {
  batchId: number;
  profile: SpeciesProfile;
  placements: readonly BatchStay[];
}

export interface PlannedPlacement extends BatchStay {
  /** Where the figures end: `to`, or the computation instant for the open placement. */
  until: number;
  pieces: CoveredPiece[];
}

/** One logger's window for the callus outlook: the 72 h up to its newest reading in the batch's current room. */
export interface OutlookWindow extends Span {
  loggerId: number;
}

export interface BatchPlan {
  batchId: number;
  profile: SpeciesProfile;
  /** Whether the batch is still in a room (its last placement is open). */
  open: boolean;
  placements: PlannedPlacement[];
  outlook: OutlookWindow[];
}

/** A window of one logger's readings, evaluated with one set of engine options (see engineKey). */
export interface Demand extends Span {
  loggerId: number;
  optionsKey: string;
}

export const demandKey = (d: Demand) => `${d.loggerId}|${d.optionsKey}|${d.from}|${d.to}`;

/**
 * `staysByRoom` lists every logger stay per room; `newestReading(loggerId, stay)` gives the newest reading that
 * logger took during that stay (up to `now`), or null. Placements starting after `now` are left out.
 */
export function planBatch(
  batch: BatchToPlan,
  staysByRoom: ReadonlyMap<number, readonly LoggerStay[]>,
  now: number,
  newestReading: (stay: LoggerStay) => number | null,
): BatchPlan {
  const placements: PlannedPlacement[] = [];
  for (const p of batch.placements) {
    const until = Math.min(p.to ?? now, now);
    if (!(until > p.from)) continue;
    placements.push({ ...p, until, pieces: splitByLoggers({ from: p.from, to: until }, staysByRoom.get(p.roomId) ?? []) });
  }
  const last = batch.placements.at(-1);
  const open = last !== undefined && last.to === null && last.from <= now;
  const outlook: OutlookWindow[] = [];
  if (open) {
    for (const stay of staysByRoom.get(last.roomId) ?? []) {
      if (!(stay.from <= now && (stay.to === null || stay.to >= now))) continue;
      const newest = newestReading(stay);
      if (newest === null) continue;
      const window = overlap({ from: newest - OUTLOOK_HOURS * HOUR, to: newest }, stay);
      if (window) outlook.push({ loggerId: stay.loggerId, ...window });
    }
  }
  return { batchId: batch.batchId, profile: batch.profile, open, placements, outlook };
}

/** Every (logger, profile, window) the plan needs, once each. */
export function demandsOf(plan: BatchPlan): Demand[] {
  const optionsKey = engineKey(plan.profile);
  const demands: Demand[] = [];
  for (const p of plan.placements) {
    for (const piece of p.pieces) {
      for (const loggerId of piece.loggerIds) demands.push({ loggerId, optionsKey, from: piece.from, to: piece.to });
    }
  }
  for (const w of plan.outlook) demands.push({ loggerId: w.loggerId, optionsKey, from: w.from, to: w.to });
  return demands;
}
