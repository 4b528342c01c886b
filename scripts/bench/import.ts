// npm run bench:import — a year of 30-second readings from one logger through the real import path, beside LOAD DATA.
import { execFile } from 'node:child_process';
import { createWriteStream } from 'node:fs';
import { promisify } from 'node:util';
import mariadb from 'mariadb';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import { Logger } from '../../server/loggers/logger.model';
import { Nursery } from '../../server/nurseries/nursery.model';
import { sqlInstant } from '../../server/readings/readingStore';
import { openBenchDatabase, peakRssMb, printTable, startBenchServer, timed } from './benchSupport';

const run = promisify(execFile);
const ROWS = 1_000_000;
const STEP_MS = 30_000;
const START = Date.UTC(2025, 10, 1);
const temperature = (i: number) => (3 + 2 * Math.sin(i / 2880 * 2 * Math.PI) + ((i * 7919) % 13) / 100).toFixed(2);

/** Streams the file to disk so the benchmark's own memory stays small and peak RSS measures the importer. */
async function writeLoggerFile(path: string, rows: number): Promise<void> {
  const out = createWriteStream(path);
  out.write('time,temperature °C\n');
  for (let i = 0; i < rows; i++) {
    if (!out.write(`${new Date(START + i * STEP_MS).toISOString()},${temperature(i)}\n`)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

async function writeLoadDataFile(path: string, rows: number, loggerId: number): Promise<void> {
  const out = createWriteStream(path);
  for (let i = 0; i < rows; i++) {
    if (!out.write(`${loggerId}\t${sqlInstant(START + i * STEP_MS)}\t${temperature(i)}\t\\N\t1\n`)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

async function main() {
  const db = await openBenchDatabase();
  const dir = await mkdtemp(join(tmpdir(), 'ck-bench-import-'));
  const nursery = await Nursery.create({ name: 'Bench Nursery', timeZone: 'UTC' });
  const logger = await Logger.create({ nurseryId: nursery.id, label: 'B-1', serial: '', notes: '' });
  const server = await startBenchServer(db, nursery.id);
  const { token } = server;
  const base = `${server.origin}/api/imports`;

  // The upload comes from another process (curl, as a nightly script would send it), so the peak RSS measured here is
  // the server's own, not the client's copy of the file.
  const send = async (path: string, name: string) => {
    const { stdout } = await run('curl', ['-sS', '-H', `authorization: Bearer ${token}`, '-F', 'logger=B-1', '-F', `file=@${path};filename=${name}`, base]);
    const body = JSON.parse(stdout) as { rows?: { accepted: number }; alreadyImported?: boolean; error?: unknown };
    if (body.error) throw new Error(`import failed: ${JSON.stringify(body)}`);
    return body;
  };

  const season = join(dir, 'season.csv');
  const nightly = join(dir, 'nightly.csv');
  await writeLoggerFile(season, ROWS);
  await writeLoggerFile(nightly, ROWS + 2880); // the next night's export: everything again plus one more day

  const first = await timed(() => send(season, 'season.csv'));
  if (first.value.rows?.accepted !== ROWS) throw new Error(`expected ${ROWS} stored, got ${JSON.stringify(first.value.rows)}`);
  const again = await timed(() => send(season, 'season.csv'));
  if (!again.value.alreadyImported) throw new Error('the identical file was not recognised');
  const overlap = await timed(() => send(nightly, 'nightly.csv'));
  if (overlap.value.rows?.accepted !== 2880) throw new Error(`nightly stored ${JSON.stringify(overlap.value.rows)}`);
  const importRss = peakRssMb();

  // The floor: the same rows into an identical empty table with LOAD DATA LOCAL INFILE, in the same run.
  const tsv = join(dir, 'rows.tsv');
  await writeLoadDataFile(tsv, ROWS, logger.id);
  // A connection of its own, opened after the imports, so nothing the app's pool did can touch the floor's figure.
  const u = new URL(process.env.DATABASE_URL!);
  const conn = await mariadb.createConnection({
    host: u.hostname, port: Number(u.port), user: decodeURIComponent(u.username), password: decodeURIComponent(u.password),
    database: u.pathname.slice(1), permitLocalInfile: true,
  });
  await conn.query('DROP TABLE IF EXISTS readings_load_data');
  await conn.query('CREATE TABLE readings_load_data LIKE readings');
  await conn.query('ALTER TABLE readings_load_data DROP FOREIGN KEY IF EXISTS readings_logger');
  const load = await timed(() =>
    conn.query({ sql: `LOAD DATA LOCAL INFILE ? INTO TABLE readings_load_data FIELDS TERMINATED BY '\\t' (logger_id, t, c, rh, import_id)` }, [tsv]),
  );
  await conn.query('DROP TABLE readings_load_data');
  await conn.end();

  const rate = (ms: number) => Math.round(ROWS / (ms / 1000)).toLocaleString('en');
  printTable(`bench:import — ${ROWS.toLocaleString('en')} rows, one logger, 30 s interval (one run)`, [
    ['import through the API (upload, detect, compare, insert)', `${(first.ms / 1000).toFixed(2)} s = ${rate(first.ms)} rows/s`],
    ['LOAD DATA LOCAL INFILE, same rows, empty table', `${(load.ms / 1000).toFixed(2)} s = ${rate(load.ms)} rows/s`],
    ['ratio import ÷ LOAD DATA (time)', `${(first.ms / load.ms).toFixed(2)}×`, '≤ 2×'],
    ['re-import of the identical file', `${(again.ms / 1000).toFixed(3)} s`, '< 1 s'],
    ['nightly file overlapping all but its last day (1,002,880 rows, 2,880 new)', `${(overlap.ms / 1000).toFixed(2)} s`, '< 3 s'],
    ['peak RSS of the server process (upload sent by curl)', `${importRss.toFixed(0)} MB`, '< 300 MB'],
  ]);
  server.close();
  await db.close();
  await rm(dir, { recursive: true, force: true });
}

await main();
