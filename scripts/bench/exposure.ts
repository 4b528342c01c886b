// `npm run bench:exposure`: the nursery-wide exposure table over a full season, cold and warm, against the time of
// simply streaming every reading out of MariaDB (the floor no computation over all readings can beat).
import { performance } from 'node:perf_hooks';
import { openDatabase } from '../../server/db/database';
import { createMigrator } from '../../server/db/migrator';
import { nurseryExposure } from '../../server/exposure/exposure.service';
import { createBenchSeason, SEASON } from './exposureSeason';

const TARGET_COLD_RATIO = 3;
const TARGET_WARM_MS = 50;
const RUNS = 5;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function timed<T>(work: () => Promise<T>): Promise<{ ms: number; result: T }> {
  const started = performance.now();
  const result = await work();
  return { ms: performance.now() - started, result };
}

async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run this through `npm run bench:exposure`.');
  const db = openDatabase(url);
  const { pool } = db;
  try {
    await createMigrator(db.sequelize).up();
    const now = Date.now();
    console.log(`Loading ${SEASON.loggers} loggers × ${SEASON.days} days at ${SEASON.intervalMinutes} min, ${SEASON.batches} batches…`);
    const load = await timed(() => createBenchSeason(pool, now));
    const season = load.result;
    console.log(`  ${season.readings.toLocaleString('en')} readings stored in ${(load.ms / 1000).toFixed(1)} s`);

    // One round of each first, not counted: the figures are for a running server, past start-up compilation.
    const floor: number[] = [];
    for (let i = -1; i < RUNS; i++) {
      const conn = await pool.getConnection();
      try {
        const run = await timed(async () => {
          let rows = 0;
          // The same columns the exposure code reads (server/readings/readingSeries.ts), streamed, nothing kept.
          const stream = conn.queryStream({ sql: 'SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED), c FROM readings', rowsAsArray: true });
          for await (const _row of stream) rows++;
          return rows;
        });
        if (run.result !== season.readings) throw new Error(`streamed ${run.result} readings, expected ${season.readings}`);
        if (i >= 0) floor.push(run.ms);
      } finally {
        conn.release();
      }
    }

    const cold: number[] = [];
    let rowCount = 0;
    for (let i = -1; i < RUNS; i++) {
      await pool.query('DELETE FROM batch_exposure_cache');
      const run = await timed(() => nurseryExposure(pool, season.nurseryId, now));
      rowCount = run.result.rows.length;
      if (i >= 0) cold.push(run.ms);
    }
    const warm: number[] = [];
    for (let i = 0; i < RUNS; i++) warm.push((await timed(() => nurseryExposure(pool, season.nurseryId, now + 1000 * (i + 1)))).ms);
    if (rowCount !== SEASON.batches) throw new Error(`the table had ${rowCount} rows, expected ${SEASON.batches}`);

    const [f, c, w] = [median(floor), median(cold), median(warm)];
    const lines = [
      `| measure (median of ${RUNS}) | time | ratio | target |`,
      '|---|---|---|---|',
      `| floor: plain SELECT streaming all ${season.readings.toLocaleString('en')} readings | ${f.toFixed(0)} ms | 1.00× | — |`,
      `| cold: nursery table, ${rowCount} batches, empty cache | ${c.toFixed(0)} ms | ${(c / f).toFixed(2)}× floor | ≤ ${TARGET_COLD_RATIO}× floor |`,
      `| warm: nursery table from the cache | ${w.toFixed(1)} ms | ${(w / f).toFixed(3)}× floor | < ${TARGET_WARM_MS} ms |`,
    ];
    console.log(`\n${lines.join('\n')}\n`);
    const met = c <= TARGET_COLD_RATIO * f && w < TARGET_WARM_MS;
    console.log(met ? 'Both targets met.' : 'A target was missed.');
    process.exitCode = met ? 0 : 1;
  } finally {
    await db.close();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
