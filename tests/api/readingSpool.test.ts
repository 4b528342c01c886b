// New readings reach MariaDB by LOAD DATA LOCAL INFILE; a server or connection that refuses local files must still get
// every reading, by batched INSERTs, with the same values.
import mariadb from 'mariadb';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Logger } from '../../server/loggers/logger.model';
import { Nursery } from '../../server/nurseries/nursery.model';
import { packReadings } from '../../server/imports/packedReadings';
import { ReadingSpool } from '../../server/readings/readingSpool';
import { startTestApp, type TestApp } from '../support/testApp';

const START = Date.UTC(2026, 0, 10);
/** More than one chunk file (under 1 MB each), humidity absent on some rows, negative values. */
const READINGS = Array.from({ length: 70_000 }, (_, i) => ({
  t: START + i * 30_000,
  c: Math.round((2 * Math.sin(i / 300) - 0.5) * 100) / 100,
  rh: i % 3 === 0 ? null : 80 + (i % 17) / 4,
  line: i + 2,
}));

describe('storing an import’s new readings', () => {
  let t: TestApp;
  let loggerIds: number[];
  const connect = (permitLocalInfile: boolean) => {
    const u = new URL(t.config.databaseUrl);
    return mariadb.createConnection({
      host: u.hostname, port: Number(u.port), user: decodeURIComponent(u.username), password: decodeURIComponent(u.password),
      database: u.pathname.slice(1), permitLocalInfile, initSql: "SET time_zone = '+00:00'", decimalAsNumber: true, bigIntAsNumber: true,
    });
  };
  const stored = async (loggerId: number) => [
    ...((await t.pool.query(
      { sql: 'SELECT CAST(UNIX_TIMESTAMP(t) * 1000 AS SIGNED), c, rh, import_id FROM readings WHERE logger_id = ? ORDER BY t', rowsAsArray: true },
      [loggerId],
    )) as unknown[]),
  ];

  beforeAll(async () => {
    t = await startTestApp({ seed: false });
    const nursery = await Nursery.create({ name: 'Spool test nursery', timeZone: 'UTC' });
    loggerIds = await Promise.all(['SP-1', 'SP-2'].map(async (label) => (await Logger.create({ nurseryId: nursery.id, label, serial: '', notes: '' })).id));
  });
  afterAll(() => t.close());

  it('loads every reading with LOAD DATA, and by batched INSERTs when the connection refuses local files, alike', async () => {
    // The refusal itself, as the spool meets it: a connection without local files cannot run LOAD DATA LOCAL.
    const refusing = await connect(false);
    const refusal = await refusing.query("LOAD DATA LOCAL INFILE '/dev/null' INTO TABLE readings (t, c, rh)").catch((err: { errno?: number }) => err);
    await refusing.end();
    expect([1148, 4166]).toContain((refusal as { errno?: number }).errno);

    for (const [loggerId, permitLocalInfile] of [[loggerIds[0], true], [loggerIds[1], false]] as const) {
      const conn = await connect(permitLocalInfile);
      const spool = await ReadingSpool.open(conn as never, loggerId, 42);
      await conn.beginTransaction();
      for (let at = 0; at < READINGS.length; at += 5000) await spool.add(packReadings(READINGS.slice(at, at + 5000)));
      await spool.finish();
      await conn.commit();
      await spool.discard();
      await conn.end();
    }
    // MariaDB has no negative zero: -0 °C comes back as 0.
    const expected = READINGS.map((r) => [r.t, r.c + 0, r.rh, 42]);
    expect(await stored(loggerIds[0])).toEqual(expected);
    expect(await stored(loggerIds[1])).toEqual(expected);
  });
});
