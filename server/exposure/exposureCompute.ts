// Computes the figures of many batches together: each logger's readings are read once and shared by every batch
// that sat in its room, whatever their placements.
import type { Pool } from 'mariadb';
import type { Exposure } from '../../shared/exposure';
import type { SpeciesProfile } from '../../shared/species/schema';
import { conflict } from '../http/errors';
import { loadSeries, newestReadingAt } from '../readings/readingSeries';
import { assembleFigures, type BatchFigures } from './batchFigures';
import { demandKey, demandsOf, planBatch, type BatchPlan, type Demand } from './batchPlan';
import { stampOf, type CacheEntry, type StampParts } from './exposureCache';
import { engineOptions } from './engineOptions';
import type { BatchRecord, ExposureInputs } from './exposureInputs';
import type { LoggerStay } from './spans';
import { exposuresOverWindows } from './windowSolver';

const stayKey = (s: LoggerStay) => `${s.loggerId}|${s.roomId}|${s.from}`;

/** The newest reading of each logger stay that the open batches' callus outlook looks at. */
async function newestReadings(pool: Pool, batches: BatchRecord[], inputs: ExposureInputs, now: number): Promise<Map<string, number | null>> {
  const stays = new Map<string, LoggerStay>();
  for (const b of batches) {
    const last = b.placements.at(-1);
    if (!last || last.to !== null) continue;
    for (const s of inputs.staysByRoom.get(last.roomId) ?? []) if (s.from <= now && (s.to === null || s.to >= now)) stays.set(stayKey(s), s);
  }
  const entries = await Promise.all(
    [...stays].map(async ([key, s]) => [key, await newestReadingAt(pool, s.loggerId, s.from, Math.min(s.to ?? now, now))] as const),
  );
  return new Map(entries);
}

function profileFor(batch: BatchRecord, inputs: ExposureInputs): SpeciesProfile {
  const profile = inputs.profiles.get(batch.speciesKey);
  if (!profile) throw conflict('profile_missing', `Batch ${batch.code} uses the species profile "${batch.speciesKey}", which no longer exists.`);
  return profile;
}

/** Demands grouped by logger, then by engine options, each window once. */
function groupDemands(plans: BatchPlan[]) {
  const byLogger = new Map<number, Map<string, { profile: SpeciesProfile; demands: Map<string, Demand> }>>();
  for (const plan of plans) {
    for (const d of demandsOf(plan)) {
      const profiles = byLogger.get(d.loggerId) ?? new Map();
      const entry = profiles.get(d.optionsKey) ?? { profile: plan.profile, demands: new Map() };
      entry.demands.set(demandKey(d), d);
      profiles.set(d.optionsKey, entry);
      byLogger.set(d.loggerId, profiles);
    }
  }
  return byLogger;
}

/**
 * Reads each logger's series over the span its demands need and answers every demand through the engine. The next
 * logger's read is already under way while this one is computed, so the database streams while the engine runs;
 * at most two loggers' readings are held at once. Also notes loggers holding readings after `now`.
 */
async function solveDemands(pool: Pool, plans: BatchPlan[], now: number) {
  const answers = new Map<string, Exposure>();
  const ahead = new Set<number>();
  const work = [...groupDemands(plans)].map(([loggerId, groups]) => {
    const entries = [...groups.values()].map(({ profile, demands }) => ({ options: engineOptions(profile), windows: [...demands.values()] }));
    const all = entries.flatMap((e) => e.windows);
    return { loggerId, entries, from: Math.min(...all.map((d) => d.from)), to: Math.max(...all.map((d) => d.to)) };
  });
  const read = (i: number) => loadSeries(pool, work[i].loggerId, work[i].from, work[i].to);
  let next = work.length ? read(0) : null;
  for (let i = 0; i < work.length; i++) {
    const series = await next!;
    next = i + 1 < work.length ? read(i + 1) : null;
    // Attached at once: should this read fail while the engine runs, the error waits for the await above.
    next?.catch(() => undefined);
    const { loggerId, entries } = work[i];
    if (series.t.length && series.t[series.t.length - 1] > now) ahead.add(loggerId);
    for (const { options, windows } of entries) {
      const results = exposuresOverWindows(series, windows, options);
      windows.forEach((d, j) => answers.set(demandKey(d), results[j]));
    }
  }
  return { answers, ahead };
}

/**
 * When the figures stop being valid by the clock alone: a logger due to arrive in or leave the batch's room later,
 * or (at once) a logger there already holding readings stamped after `now`.
 */
function validUntilOf(batch: BatchRecord, inputs: ExposureInputs, ahead: Set<number>, now: number): number | null {
  const last = batch.placements.at(-1);
  if (!last || last.to !== null) return null;
  let until: number | null = null;
  for (const s of inputs.staysByRoom.get(last.roomId) ?? []) {
    if (ahead.has(s.loggerId) && (s.to === null || s.to > last.from)) return now;
    for (const edge of [s.from, s.to]) if (edge !== null && edge > now && (until === null || edge < until)) until = edge;
  }
  return until;
}

/** Figures and cache entries for the given batches as of `now`. */
export async function computeFigures(
  pool: Pool,
  batches: BatchRecord[],
  inputs: ExposureInputs,
  parts: StampParts,
  now: number,
): Promise<CacheEntry[]> {
  const newest = await newestReadings(pool, batches, inputs, now);
  const plans = batches.map((b) =>
    planBatch({ batchId: b.id, profile: profileFor(b, inputs), placements: b.placements }, inputs.staysByRoom, now, (s) => newest.get(stayKey(s)) ?? null),
  );
  const { answers, ahead } = await solveDemands(pool, plans, now);
  const lookup = (d: Demand) => answers.get(demandKey(d))!;
  return plans.map((plan, i) => {
    const figures: BatchFigures = assembleFigures(plan, lookup, now);
    return { batchId: plan.batchId, stamp: stampOf(batches[i], parts), validUntil: validUntilOf(batches[i], inputs, ahead, now), figures };
  });
}
