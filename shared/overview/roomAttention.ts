// Which rooms need someone first, from what the overview already knows about each: plain rules, each stated as a
// sentence, so staff see why a room is at the top and not only that it is.
import { isStale } from '../series/freshness';

/**
 * With no batch (so no species limit) in the room: warn at ≤ 0 °C, alarm at ≤ −2 °C, the suggested limits for
 * unfrozen grafts (REFERENCES §3 last row [DESIGN], from USDA FS "Basic Storage Principles" [PUB]).
 */
export const DEFAULT_WARN_C = 0;
export const DEFAULT_FREEZE_C = -2;

export type AttentionLevel = 'alarm' | 'warn' | 'ok' | 'idle';
export const ATTENTION_RANK: Record<AttentionLevel, number> = { alarm: 3, warn: 2, ok: 1, idle: 0 };

export interface Concern {
  level: 'alarm' | 'warn';
  message: string;
}

export interface RoomState {
  loggersNow: { label: string; latest: { t: number; c: number } | null; intervalMs: number | null }[];
  /** The room's lowest reading over the last 24 h, any logger. */
  lowest24hC: number | null;
  /** The species stored there now, with their limits. */
  species: { name: string; freezeC: number; band: { minC: number; maxC: number } }[];
  batchCount: number;
}

const fmt = (c: number) => `${c.toFixed(1)} °C`;

export function roomConcerns(room: RoomState, now: number): Concern[] {
  const concerns: Concern[] = [];
  if (room.loggersNow.length === 0) {
    if (room.batchCount > 0) concerns.push({ level: 'warn', message: 'Grafts are stored here but no logger records the room.' });
    return concerns;
  }
  // The most sensitive stored species sets the freeze limit; an empty room uses the general one.
  const freezeC = room.species.length ? Math.max(...room.species.map((s) => s.freezeC)) : DEFAULT_FREEZE_C;
  for (const logger of room.loggersNow) {
    const { latest } = logger;
    if (!latest) {
      concerns.push({ level: 'warn', message: `${logger.label} has no readings yet.` });
      continue;
    }
    if (isStale(latest.t, logger.intervalMs, now)) {
      concerns.push({ level: 'warn', message: `${logger.label} has sent nothing new; its latest reading may be out of date.` });
      continue;
    }
    if (latest.c < freezeC) concerns.push({ level: 'alarm', message: `${logger.label} reads ${fmt(latest.c)}, below the freeze limit of ${fmt(freezeC)}.` });
    else if (room.species.length === 0 && latest.c <= DEFAULT_WARN_C) concerns.push({ level: 'warn', message: `${logger.label} reads ${fmt(latest.c)}, at or below freezing.` });
    for (const s of room.species) {
      if (latest.c >= freezeC && latest.c < s.band.minC) concerns.push({ level: 'warn', message: `${logger.label} reads ${fmt(latest.c)}, below the ${s.name} band (from ${fmt(s.band.minC)}).` });
      if (latest.c > s.band.maxC) concerns.push({ level: 'warn', message: `${logger.label} reads ${fmt(latest.c)}, above the ${s.name} band (up to ${fmt(s.band.maxC)}).` });
    }
  }
  if (room.lowest24hC !== null && room.lowest24hC < freezeC && !concerns.some((c) => c.level === 'alarm')) {
    concerns.push({ level: 'warn', message: `Went down to ${fmt(room.lowest24hC)} in the last 24 h, below the freeze limit of ${fmt(freezeC)}.` });
  }
  return concerns;
}

export function attentionLevel(room: RoomState, concerns: readonly Concern[]): AttentionLevel {
  if (concerns.some((c) => c.level === 'alarm')) return 'alarm';
  if (concerns.length) return 'warn';
  return room.loggersNow.length || room.batchCount ? 'ok' : 'idle';
}
