import type { Pool } from 'mariadb';
import type { ExposureReport } from '../../shared/exposure';
import { ATTENTION_RANK, attentionLevel, roomConcerns } from '../../shared/overview/roomAttention';
import { staleAfterMs } from '../../shared/series/freshness';
import { planBucketGrid, type BucketGrid } from '../../shared/series/bucketGrid';
import type { SpeciesProfile } from '../../shared/species/schema';
import { nurseryExposure } from '../exposure/exposure.service';
import { Logger } from '../loggers/logger.model';
import { LoggerPlacement } from '../loggers/loggerPlacement.model';
import { profilesOf } from '../profiles/profiles.service';
import { Room } from '../rooms/room.model';
import { loggersInRoom, type LoggerInRoom } from '../series/placementWindows';
import { readPieces } from '../series/readingPieces';
import { loggerLines } from '../series/roomSeries';
import { latestReading } from './latestReadings';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
/** The overview's small chart: a week, drawn about 150 px wide on a phone. */
export const SPARKLINE_DAYS = 7;
export const SPARKLINE_WIDTH = 150;

type StoredBatch = Awaited<ReturnType<typeof nurseryExposure>>['rows'][number];
const iso = (t: number) => new Date(t).toISOString();

interface Extreme {
  t: number;
  c: number;
  logger: string;
}

/** The room's lowest and highest reading over the last 24 h, whichever logger took it. */
async function lastDayExtremes(pool: Pool, week: readonly LoggerInRoom[], now: number) {
  let low = null as Extreme | null;
  let high = null as Extreme | null;
  for (const logger of week) {
    for (const w of logger.windows) {
      const from = Math.max(w.from, now - DAY);
      if (w.to < from) continue;
      for (const p of (await readPieces(pool, logger.loggerId, from, w.to, 30)).c) {
        if (!low || p.min.v < low.c) low = { t: p.min.t, c: p.min.v, logger: logger.label };
        if (!high || p.max.v > high.c) high = { t: p.max.t, c: p.max.v, logger: logger.label };
      }
    }
  }
  const present = (e: Extreme | null) => e && { t: iso(e.t), c: e.c, logger: e.logger };
  return { low: present(low), high: present(high) };
}

async function loggersNow(pool: Pool, roomId: number) {
  const open = await LoggerPlacement.findAll({
    where: { roomId, placedTo: null },
    include: [{ model: Logger, as: 'logger', attributes: ['label'] }],
  });
  const loggers = await Promise.all(
    open.map(async (p) => ({ id: p.loggerId, label: (p as LoggerPlacement & { logger: Logger }).logger.label, ...(await latestReading(pool, p.loggerId, p.placedFrom.getTime())) })),
  );
  return loggers.sort((a, b) => a.label.localeCompare(b.label));
}

function presentBatch(b: StoredBatch) {
  const h: ExposureReport | null = b.headline;
  return {
    id: b.batchId,
    code: b.code,
    speciesName: b.speciesName,
    scionCultivar: b.scionCultivar,
    count: b.count,
    since: b.since,
    worst: h && { minC: h.minC, maxC: h.maxC, freezeHours: h.freeze.hours, belowHours: h.below.hours, aboveHours: h.above.hours, hoursMissing: h.hoursMissing },
    callusPct: b.progress?.progressPct ?? null,
    fullCallusAt: b.progress?.outlook.fullCallusAt ?? null,
  };
}

async function roomCard(pool: Pool, room: Room, batches: StoredBatch[], profiles: Map<string, SpeciesProfile>, grid: BucketGrid, now: number) {
  const week = await loggersInRoom(room.id, now - SPARKLINE_DAYS * DAY, now);
  const [current, last24h, lines] = await Promise.all([
    loggersNow(pool, room.id),
    lastDayExtremes(pool, week, now),
    Promise.all(week.map((l) => loggerLines(pool, l, grid))),
  ]);
  const species = [...new Set(batches.map((b) => b.species))].flatMap((key) => {
    const p = profiles.get(key);
    return p ? [{ name: p.name, freezeC: p.freezeC, band: p.band }] : [];
  });
  const state = { loggersNow: current.map((l) => ({ label: l.label, latest: l.latest, intervalMs: l.intervalMs })), lowest24hC: last24h.low?.c ?? null, species, batchCount: batches.length };
  const concerns = roomConcerns(state, now);
  return {
    id: room.id,
    name: room.name,
    kind: room.kind,
    attention: attentionLevel(state, concerns),
    concerns,
    loggers: current.map((l) => ({
      id: l.id,
      label: l.label,
      latest: l.latest && { t: iso(l.latest.t), c: l.latest.c, rh: l.latest.rh },
      intervalMinutes: l.intervalMs === null ? null : l.intervalMs / 60_000,
      staleAfterMinutes: staleAfterMs(l.intervalMs) / 60_000,
    })),
    last24h,
    sparkline: lines.map((l) => ({ id: l.id, label: l.label, temperature: l.temperature })),
    batches: batches.map(presentBatch),
  };
}

/**
 * Every room of the nursery in one answer, the rooms needing attention first: latest reading per logger there now
 * with its age limit, the last 24 h low and high, a week's M4 sparkline per logger, and the batches stored there with
 * their headline exposure and callus progress (from the nursery's exposure table).
 */
export async function nurseryOverview(pool: Pool, nurseryId: number, now = Date.now()) {
  const [rooms, stored, profiles] = await Promise.all([
    Room.findAll({ where: { nurseryId }, order: [['name', 'ASC']] }),
    nurseryExposure(pool, nurseryId, now),
    profilesOf(nurseryId),
  ]);
  const grid = planBucketGrid(now - SPARKLINE_DAYS * DAY, now, SPARKLINE_WIDTH);
  const cards = await Promise.all(rooms.map((room) => roomCard(pool, room, stored.rows.filter((b) => b.roomId === room.id), profiles, grid, now)));
  cards.sort((a, b) => ATTENTION_RANK[b.attention] - ATTENTION_RANK[a.attention] || a.name.localeCompare(b.name));
  return { asOf: iso(now), sparkline: { from: iso(now - SPARKLINE_DAYS * DAY), to: iso(now) }, rooms: cards };
}
