// An invented season for the exposure benchmark: 20 loggers in 10 rooms at 5-minute readings for 150 days, and
// 1,000 batches made on grafting days, most moved once from their first room to another.
import type { Pool } from 'mariadb';
import { sqlInstant } from '../../server/readings/readingStore';
import { seededRandom } from '../../server/seed/demoClimate';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;
export const SEASON = { loggers: 20, rooms: 10, days: 150, intervalMinutes: 5, batches: 1000, graftingDays: 40 };

/** Warm rooms for the nut trees, cold ones for pome and stone fruit, each with its own level and swing. */
const ROOMS = Array.from({ length: SEASON.rooms }, (_, i) => ({ name: `Bench room ${i + 1}`, warm: i < 3, levelC: i < 3 ? 25 + i : 1 + i * 0.6 }));
const SPECIES = { warm: ['walnut', 'chestnut'], cold: ['apple', 'pear', 'plum', 'peach'] };

export interface BenchSeason {
  nurseryId: number;
  start: number;
  end: number;
  readings: number;
}

/** Inserts rows through batch() and returns their ids: the newest n of a table nobody else writes to. */
async function insertRows(pool: Pool, sql: string, rows: unknown[][]): Promise<number[]> {
  await pool.batch(sql, rows);
  const table = /INSERT INTO (\w+)/.exec(sql)![1];
  const ids = (await pool.query({ sql: `SELECT id FROM ${table} ORDER BY id DESC LIMIT ?`, rowsAsArray: true }, [rows.length])) as [number][];
  return ids.map(([id]) => id).reverse();
}

/** Readings go in per logger in one transaction each, as strings through batch(): the connector's fast path. */
async function storeReadings(pool: Pool, loggerId: number, importId: number, roomIndex: number, start: number, end: number): Promise<number> {
  const random = seededRandom(loggerId * 104_729);
  const room = ROOMS[roomIndex];
  const rows: (string | number)[][] = [];
  for (let t = start; t < end; t += SEASON.intervalMinutes * MINUTE) {
    const daily = Math.sin((2 * Math.PI * (t % DAY)) / DAY);
    const weather = Math.sin((2 * Math.PI * t) / (6.3 * DAY));
    const swing = room.warm ? 0.8 : 2.2;
    const c = room.levelC + swing * (0.5 * daily + weather) + 0.3 * (random() - 0.5);
    rows.push([loggerId, sqlInstant(t), c.toFixed(4), importId]);
  }
  const conn = await pool.getConnection();
  try {
    await conn.beginTransaction();
    await conn.batch('INSERT INTO readings (logger_id, t, c, import_id) VALUES (?, ?, ?, ?)', rows);
    await conn.commit();
  } finally {
    conn.release();
  }
  return rows.length;
}

export async function createBenchSeason(pool: Pool, now: number): Promise<BenchSeason> {
  const end = Math.floor(now / (5 * MINUTE)) * 5 * MINUTE;
  const start = end - SEASON.days * DAY;
  const at = sqlInstant(start);
  const [nursery] = await insertRows(pool, 'INSERT INTO nurseries (name, time_zone, created_at, updated_at) VALUES (?, ?, ?, ?)', [['Bench Hollow', 'UTC', at, at]]);
  const roomIds = await insertRows(pool, 'INSERT INTO rooms (nursery_id, name, kind, notes, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?)',
    ROOMS.map((r) => [nursery, r.name, r.warm ? 'back room' : 'cellar', '', at, at]));
  const loggerRooms = Array.from({ length: SEASON.loggers }, (_, i) => i % SEASON.rooms);
  const loggerIds = await insertRows(pool, 'INSERT INTO loggers (nursery_id, label, serial, notes, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?)',
    loggerRooms.map((_, i) => [nursery, `B-${String(i + 1).padStart(2, '0')}`, '', '', at, at]));
  await pool.batch('INSERT INTO logger_placements (logger_id, room_id, placed_from, created_at, updated_at) VALUES (?, ?, ?, ?, ?)',
    loggerIds.map((id, i) => [id, roomIds[loggerRooms[i]], at, at, at]));
  const importIds = await insertRows(pool,
    `INSERT INTO imports (nursery_id, logger_id, file_name, file_sha256, file_bytes, status, started_at, created_at, updated_at)
     VALUES (?, ?, ?, ?, 0, 'completed', ?, ?, ?)`,
    loggerIds.map((id) => [nursery, id, `B-${id}.csv`, String(id).padStart(64, '0'), at, at, at]));
  let readings = 0;
  for (let i = 0; i < loggerIds.length; i++) readings += await storeReadings(pool, loggerIds[i], importIds[i], loggerRooms[i], start, end);

  // Grafting days in the first 60 days; each day's batches go to a warm or a cold room by species, and most move on
  // (warm callusing → cold holding, or cold room → another cold room) 10 to 40 days later.
  const random = seededRandom(20_261_102);
  const batchRows: unknown[][] = [];
  const placements: { room: number; from: number; to: number | null }[][] = [];
  for (let b = 0; b < SEASON.batches; b++) {
    const day = Math.floor(b / (SEASON.batches / SEASON.graftingDays));
    const grafted = start + Math.round((day * 60 * DAY) / SEASON.graftingDays) + 8 * HOUR;
    const warm = random() < 0.25;
    const list = warm ? SPECIES.warm : SPECIES.cold;
    const species = list[Math.floor(random() * list.length)];
    const first = warm ? Math.floor(random() * 3) : 3 + Math.floor(random() * 7);
    const stays = [{ room: first, from: grafted + 2 * HOUR, to: null as number | null }];
    if (random() < 0.8) {
      const moved = stays[0].from + (10 + Math.floor(random() * 30)) * DAY + Math.floor(random() * 24) * HOUR;
      stays[0].to = moved;
      stays.push({ room: 3 + ((first + 1 + Math.floor(random() * 6)) % 7), from: moved, to: null });
    }
    placements.push(stays);
    batchRows.push([nursery, `B-${String(b + 1).padStart(4, '0')}`, species, 'Bench cultivar', 'Bench stock', 'whip-and-tongue', 25,
      new Date(grafted).toISOString().slice(0, 10), '', '', '', 'in_storage', at, at]);
  }
  const batchIds = await insertRows(pool,
    `INSERT INTO batches (nursery_id, code, species_key, scion_cultivar, rootstock, method, graft_count, grafted_on, grafter, storage_medium,
      notes, status, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`, batchRows);
  await pool.batch('INSERT INTO batch_placements (batch_id, room_id, placed_from, placed_to, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?)',
    batchIds.flatMap((id, i) => placements[i].map((p) => [id, roomIds[p.room], sqlInstant(p.from), p.to === null ? null : sqlInstant(p.to), at, at])));
  return { nurseryId: nursery, start, end, readings };
}
