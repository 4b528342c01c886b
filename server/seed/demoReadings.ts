import type { Pool } from 'mariadb';
import { Logger } from '../loggers/logger.model';
import { Import } from '../imports/import.model';
import { storedC, sqlInstant } from '../readings/readingStore';
import { humidityAt, seededRandom, temperatureAt, type ClimateName } from './demoClimate';
import { DEMO_SEASON_START } from './demoData';

const INTERVAL_MS = 10 * 60_000;
const CLIMATE_OF: Record<string, ClimateName> = {
  'K-01': 'cellar', 'K-02': 'garage-door', 'K-03': 'garage-wall', 'K-04': 'callus', 'K-05': 'fridge',
};
/** K-05 missed two days (a flat battery): the charts and exposure must show that gap, not bridge it. */
const GAP = { label: 'K-05', from: DEMO_SEASON_START.getTime() + 9 * 24 * 3600_000, to: DEMO_SEASON_START.getTime() + 11 * 24 * 3600_000 };

/**
 * Brings every demo logger's readings up to now, as a nightly import would: each start adds what is missing,
 * so the demo never looks abandoned. Rows go in with the connector's batch, like real imports.
 */
export async function topUpDemoReadings(pool: Pool, nurseryId: number, now = Date.now()): Promise<number> {
  const loggers = await Logger.findAll({ where: { nurseryId } });
  let added = 0;
  for (const logger of loggers) {
    const climate = CLIMATE_OF[logger.label];
    if (!climate) continue;
    const [last] = (await pool.query('SELECT CAST(UNIX_TIMESTAMP(MAX(t)) * 1000 AS SIGNED) AS ms FROM readings WHERE logger_id = ?', [logger.id])) as { ms: number | null }[];
    const start = last.ms === null ? DEMO_SEASON_START.getTime() : last.ms + INTERVAL_MS;
    if (start > now) continue;
    const record = await Import.create({
      nurseryId, loggerId: logger.id, userId: null, tokenId: null, fileName: `demo-${logger.label}.csv`,
      fileSha256: `demo-${logger.id}-${start}`.padEnd(64, '0').slice(0, 64), fileBytes: 0, status: 'running', startedAt: new Date(),
    });
    const random = seededRandom(logger.id * 7919);
    const rows: (string | number | null)[][] = [];
    let first: number | null = null;
    let lastAt: number | null = null;
    for (let t = start; t <= now; t += INTERVAL_MS) {
      const noise = random() * 2 - 1;
      if (logger.label === GAP.label && t >= GAP.from && t < GAP.to) continue;
      first ??= t;
      lastAt = t;
      const rh = humidityAt(climate, random() * 2 - 1);
      rows.push([logger.id, sqlInstant(t), storedC(temperatureAt(climate, t, noise)).toFixed(4), rh === null ? null : rh.toFixed(2), record.id]);
    }
    const conn = await pool.getConnection();
    try {
      await conn.beginTransaction();
      if (rows.length) await conn.batch('INSERT IGNORE INTO readings (logger_id, t, c, rh, import_id) VALUES (?, ?, ?, ?, ?)', rows);
      await conn.commit();
    } finally {
      conn.release();
    }
    await record.update({
      status: 'completed', finishedAt: new Date(), rowsTotal: rows.length, rowsAccepted: rows.length, rowsStored: rows.length,
      firstAt: first === null ? null : new Date(first), lastAt: lastAt === null ? null : new Date(lastAt),
    });
    added += rows.length;
  }
  return added;
}
