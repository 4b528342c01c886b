// npm run bench:series — the room chart endpoint on a year of one-minute readings (525,600) for a 1,200 px chart, beside
// a plain SELECT of the same rows and the two ways of reducing them per request that the stored blocks replace.
import { Import } from '../../server/imports/import.model';
import { Logger } from '../../server/loggers/logger.model';
import { LoggerPlacement } from '../../server/loggers/loggerPlacement.model';
import { Nursery } from '../../server/nurseries/nursery.model';
import { sqlInstant } from '../../server/readings/readingStore';
import { Room } from '../../server/rooms/room.model';
import { MAX_GAP_MS } from '../../server/series/roomSeries';
import { rangeQuery, type RawRow } from '../../server/series/rawReadings';
import { createM4 } from '../../shared/series/m4';
import type { PackedLine } from '../../shared/series/packedLine';
import { median, openBenchDatabase, printTable, startBenchServer, timed } from './benchSupport';

const MINUTE = 60_000;
const ROWS = 525_600;
const START = Date.UTC(2025, 10, 1);
const END = START + ROWS * MINUTE - 1;
const WIDTH = 1200;
const RUNS = 7;
const temperature = (i: number) => (3 + 2 * Math.sin((i / 1440) * 2 * Math.PI) + ((i * 7919) % 13) / 100).toFixed(2);

async function loadYear(db: Awaited<ReturnType<typeof openBenchDatabase>>, nurseryId: number, loggerId: number) {
  const record = await Import.create({
    nurseryId, loggerId, userId: null, tokenId: null, fileName: 'bench-year.csv', fileSha256: 'b'.repeat(64), fileBytes: 0, status: 'running', startedAt: new Date(),
  });
  const conn = await db.pool.getConnection();
  await conn.beginTransaction();
  for (let s = 0; s < ROWS; s += 100_000) {
    const rows: string[][] = [];
    for (let i = s; i < Math.min(ROWS, s + 100_000); i++) rows.push([String(loggerId), sqlInstant(START + i * MINUTE), temperature(i), String(record.id)]);
    await conn.batch('INSERT INTO readings (logger_id, t, c, import_id) VALUES (?, ?, ?, ?)', rows);
  }
  await conn.commit();
  conn.release();
  await record.update({ status: 'completed', finishedAt: new Date(), rowsTotal: ROWS, rowsAccepted: ROWS, rowsStored: ROWS, firstAt: new Date(START), lastAt: new Date(END) });
}

/** Per pixel column in SQL: lowest, highest, first and last with their instants, packed into BIGINTs to travel with MIN/MAX. */
const GROUP_SQL = `
  SELECT b, MIN(ms), MAX(ms), MIN(c), MAX(c),
         MIN(cc * 137438953472 + ms) MOD 137438953472, 137438953471 - MAX(cc * 137438953472 + 137438953471 - ms) MOD 137438953472,
         MIN(ms * 33554432 + cc) MOD 33554432, MAX(ms * 33554432 + cc) MOD 33554432
    FROM (SELECT TIMESTAMPDIFF(MICROSECOND, ?, t) DIV 1000 AS ms, CAST(c * 10000 AS SIGNED) + 10000000 AS cc, c,
                 (TIMESTAMPDIFF(MICROSECOND, ?, t) DIV 1000) * ? DIV ? AS b
            FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?) x
   GROUP BY b`;

async function main() {
  const db = await openBenchDatabase();
  const nursery = await Nursery.create({ name: 'Bench Nursery', timeZone: 'UTC' });
  const room = await Room.create({ nurseryId: nursery.id, name: 'Bench room', kind: 'cellar', notes: '' });
  const logger = await Logger.create({ nurseryId: nursery.id, label: 'B-1', serial: '', notes: '' });
  await LoggerPlacement.create({ loggerId: logger.id, roomId: room.id, placedFrom: new Date(START) });
  console.log(`Storing ${ROWS.toLocaleString('en')} one-minute readings…`);
  await loadYear(db, nursery.id, logger.id);

  const server = await startBenchServer(db, nursery.id);
  const { token } = server;
  const query = new URLSearchParams({ from: new Date(START).toISOString(), to: new Date(END).toISOString(), width: String(WIDTH) });
  const url = `${server.origin}/api/rooms/${room.id}/series?${query}`;
  const request = async () => {
    const res = await fetch(url, { headers: { authorization: `Bearer ${token}` } });
    const text = await res.text();
    if (!res.ok) throw new Error(`series failed: ${text}`);
    return text;
  };
  const runs = async <T>(n: number, work: () => Promise<T>) => {
    const ms: number[] = [];
    let value!: T;
    for (let i = 0; i < n; i++) ({ ms: ms[ms.length], value } = await timed(work));
    return { ms: median(ms), value };
  };

  const plain = await runs(5, async () => {
    const rows = await db.pool.query({ sql: 'SELECT t, c, rh FROM readings WHERE logger_id = ? AND t BETWEEN ? AND ?', rowsAsArray: true }, [logger.id, sqlInstant(START), sqlInstant(END)]);
    return (rows as unknown[]).length;
  });
  if (plain.value !== ROWS) throw new Error(`plain SELECT returned ${plain.value} rows`);

  const streamed = await runs(3, async () => {
    const conn = await db.pool.getConnection();
    try {
      const m4 = createM4({ origin: START, span: END - START + 1, count: WIDTH, blockMinutes: null }, MAX_GAP_MS);
      const { sql, values } = rangeQuery(logger.id, [{ from: START, to: END + 1 }]);
      for await (const [t, c] of conn.queryStream({ sql, rowsAsArray: true }, values) as AsyncIterable<RawRow>) m4.pushReading(t, c);
      return m4.finish().length;
    } finally {
      conn.release();
    }
  });
  const grouped = await runs(3, async () => {
    const rows = await db.pool.query({ sql: GROUP_SQL, rowsAsArray: true }, [sqlInstant(START), sqlInstant(START), WIDTH, END - START + 1, logger.id, sqlInstant(START), sqlInstant(END)]);
    return (rows as unknown[]).length;
  });

  const first = await timed(request);
  const warm = await runs(RUNS, request);
  const body = JSON.parse(warm.value) as { blockMinutes: number; bucketMs: number; loggers: { temperature: PackedLine }[] };
  const points = body.loggers[0].temperature.v.length;
  const bytes = Buffer.byteLength(warm.value);
  const ms = (x: number) => `${x.toFixed(0)} ms`;

  printTable(`bench:series — ${ROWS.toLocaleString('en')} one-minute readings, ${WIDTH} px chart (medians)`, [
    ['plain SELECT of the year (rowsAsArray)', ms(plain.ms)],
    [`per request: streamed pass + M4 in JS (${streamed.value} points)`, ms(streamed.ms)],
    [`per request: GROUP BY pixel column in SQL, instants packed in BIGINTs (${grouped.value} buckets)`, ms(grouped.ms)],
    ['endpoint, first request after the import (builds the stored blocks)', ms(first.ms)],
    [`endpoint, from stored ${body.blockMinutes}-min blocks (${(body.bucketMs / 3_600_000).toFixed(0)} h buckets), median of ${RUNS}`, ms(warm.ms), '< 200 ms'],
    ['payload', `${(bytes / 1024).toFixed(1)} KB`, '< 100 KB'],
    ['points', points.toLocaleString('en'), `≤ ${(4 * WIDTH).toLocaleString('en')}`],
  ]);
  server.close();
  await db.close();
}

await main();
