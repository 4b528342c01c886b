import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

const SAMPLE = readFileSync('samples/root-cellar-k01-iso.csv');

/** A file of n ten-minute readings from `start`, optionally with a value changed at one row. */
function seriesFile(n: number, start = Date.UTC(2026, 0, 5), change?: { index: number; c: number }) {
  const lines = ['time,temperature °C'];
  for (let i = 0; i < n; i++) {
    const c = change?.index === i ? change.c : 3 + Math.sin(i / 20);
    lines.push(`${new Date(start + i * 600_000).toISOString()},${c.toFixed(2)}`);
  }
  return Buffer.from(`${lines.join('\n')}\n`);
}

describe('importing logger files through the API', () => {
  let t: TestApp;
  let staff: Awaited<ReturnType<typeof signIn>>;
  let loggerLabel: string;
  let loggerId: number;
  const countReadings = async () => {
    const [row] = (await t.pool.query('SELECT COUNT(*) AS n FROM readings WHERE logger_id = ?', [loggerId])) as { n: number }[];
    return Number(row.n);
  };
  const upload = (content: Buffer, name: string, fields: Record<string, string> = {}) =>
    Object.entries({ logger: loggerLabel, ...fields })
      .reduce((r, [k, v]) => r.field(k, v), staff.post('/api/imports'))
      .attach('file', content, name);

  beforeAll(async () => {
    t = await startTestApp();
    staff = await signIn(t.app, 'staff@example.com');
    const made = await staff.post('/api/loggers').send({ label: 'IMP-1', serial: 'S-IMP-1' });
    loggerLabel = made.body.label;
    loggerId = made.body.id;
  });
  afterAll(() => t.close());

  it('previews without storing (dry run), then imports and stores every reading once', async () => {
    const preview = await upload(SAMPLE, 'cellar.csv', { dryRun: 'true' });
    expect(preview.status).toBe(200);
    expect(preview.body.dryRun).toBe(true);
    expect(preview.body.detected.temperature.unit).toBe('C');
    expect(preview.body.preview.length).toBeGreaterThan(0);
    expect(await countReadings()).toBe(0);

    const first = await upload(SAMPLE, 'cellar.csv');
    expect(first.status).toBe(201);
    const { rows } = first.body;
    expect(rows.total).toBe(rows.accepted + rows.rejected + rows.duplicates + rows.conflicts);
    expect(rows.accepted).toBe(preview.body.rows.accepted);
    expect(await countReadings()).toBe(rows.accepted);
    expect(first.body.import.status).toBe('completed');
  });

  it('recognises an identical file by its SHA-256 and stores nothing again', async () => {
    const before = await countReadings();
    const again = await upload(SAMPLE, 'cellar-copy.csv');
    expect(again.status).toBe(200);
    expect(again.body.alreadyImported).toBe(true);
    expect(again.body.rows.accepted).toBe(0);
    expect(await countReadings()).toBe(before);
  });

  it('an overlapping file adds only the new readings; a changed value is a reported conflict, never an overwrite', async () => {
    const label = 'IMP-2';
    const made = await staff.post('/api/loggers').send({ label });
    const first = await upload(seriesFile(300), 'a.csv', { logger: label });
    expect(first.body.rows.accepted).toBe(300);
    const overlapping = await upload(seriesFile(400, Date.UTC(2026, 0, 5), { index: 10, c: 9.99 }), 'b.csv', { logger: label });
    expect(overlapping.status).toBe(201);
    expect(overlapping.body.rows).toEqual({ total: 400, accepted: 100, rejected: 0, duplicates: 299, conflicts: 1 });
    expect(overlapping.body.conflictLines[0]).toMatchObject({ line: 12 });
    const [stored] = (await t.pool.query('SELECT c FROM readings WHERE logger_id = ? AND t = ?', [made.body.id, '2026-01-05 01:40:00.000'])) as { c: number }[];
    expect(stored.c).not.toBe(9.99);
  });

  it('a re-export that continues an earlier file reads only the new part, with physical line numbers kept', async () => {
    const label = 'IMP-5';
    await staff.post('/api/loggers').send({ label });
    const head = '# Invented test rig\nLogger: IMP-5\ntime,temperature °C\n';
    const rows = (from: number, n: number) =>
      Array.from({ length: n }, (_, i) => `${new Date(Date.UTC(2026, 3, 1) + (from + i) * 600_000).toISOString()},${(2 + ((from + i) % 7) / 10).toFixed(1)}\n`).join('');
    const lastNight = `${head}${rows(0, 50)}2026-04-01T09:00:00Z,ERR\n${rows(51, 49)}`;
    const tonight = `${lastNight}${rows(100, 20)}2026-04-02T00:00:00Z,oops\n${rows(121, 9)}`;
    const first = await upload(Buffer.from(lastNight), 'k.csv', { logger: label });
    expect(first.body.rows).toMatchObject({ total: 100, accepted: 99, rejected: 1 });
    const second = await upload(Buffer.from(tonight), 'k.csv', { logger: label });
    expect(second.status).toBe(201);
    expect(second.body.rows).toEqual({ total: 130, accepted: 29, rejected: 2, duplicates: 99, conflicts: 0 });
    // Line 54 of both files is the ERR row; the new bad row is line 3 + 121 = 124 of tonight's file.
    expect(second.body.rejectedLines.map((n: { line: number }) => n.line)).toEqual([54, 124]);
    expect(second.body.span.first).toBe(new Date(Date.UTC(2026, 3, 1)).toISOString());
    // What it stored is the new part alone; chart blocks are rebuilt over that, not over the file's whole span.
    const [record] = (await t.pool.query(
      'SELECT CAST(UNIX_TIMESTAMP(stored_first_at) * 1000 AS SIGNED) AS first, CAST(UNIX_TIMESTAMP(stored_last_at) * 1000 AS SIGNED) AS last FROM imports WHERE id = ?',
      [second.body.import.id],
    )) as { first: number; last: number }[];
    expect(record).toEqual({ first: Date.UTC(2026, 3, 1) + 100 * 600_000, last: Date.UTC(2026, 3, 1) + 129 * 600_000 });
  });

  it('two imports of the same file at the same moment store each reading once', async () => {
    const label = 'IMP-3';
    const made = await staff.post('/api/loggers').send({ label });
    const file = seriesFile(2000, Date.UTC(2026, 1, 1));
    const [a, b] = await Promise.all([upload(file, 'x.csv', { logger: label }), upload(file, 'x.csv', { logger: label })]);
    const accepted = [a, b].map((r) => r.body.rows?.accepted ?? 0);
    expect(accepted.reduce((x, y) => x + y, 0)).toBe(2000);
    const [row] = (await t.pool.query('SELECT COUNT(*) AS n FROM readings WHERE logger_id = ?', [made.body.id])) as { n: number }[];
    expect(Number(row.n)).toBe(2000);
  });

  it('an import that fails half-way stores nothing and is marked failed; the re-run completes it', async () => {
    const label = 'IMP-4';
    const made = await staff.post('/api/loggers').send({ label });
    // A mixed-unit column is found only after earlier batches went in: the whole import must roll back.
    const good = seriesFile(12000, Date.UTC(2026, 2, 1)).toString().trimEnd().split('\n');
    const broken = [...good, '2026-04-01T00:00:00Z,40 °F'].join('\n');
    const failed = await upload(Buffer.from(broken), 'half.csv', { logger: label });
    expect(failed.status).toBeGreaterThanOrEqual(400);
    const count = async () => Number(((await t.pool.query('SELECT COUNT(*) AS n FROM readings WHERE logger_id = ?', [made.body.id])) as { n: number }[])[0].n);
    expect(await count()).toBe(0);
    const list = (await staff.get('/api/imports?status=failed')).body as { loggerLabel: string; status: string }[];
    expect(list.some((i) => i.loggerLabel === label)).toBe(true);

    const rerun = await upload(Buffer.from(`${good.join('\n')}\n`), 'half-fixed.csv', { logger: label });
    expect(rerun.status).toBe(201);
    expect(await count()).toBe(12000);
  });

  it('answers files it cannot read with a clear error and stores nothing', async () => {
    const before = Number(((await t.pool.query('SELECT COUNT(*) AS n FROM readings')) as { n: number }[])[0].n);
    const cases: [string, Buffer, string][] = [
      ['empty', Buffer.alloc(0), 'empty'],
      ['header only', Buffer.from('time,temperature °C\n'), 'no_data'],
      ['binary', Buffer.from([0, 1, 2, 3, 255, 254, 0, 0, 7, 8]), 'binary'],
    ];
    for (const [, content, code] of cases) {
      const res = await upload(content, 'bad.csv');
      expect(res.status).toBe(422);
      expect(res.body.error.code).toBe(code);
    }
    const unknownUnit = await upload(Buffer.from('time,value\n2026-01-01T00:00:00Z,3.1\n2026-01-01T00:10:00Z,3.2\n'), 'nounit.csv');
    expect(unknownUnit.status).toBe(422);
    expect(unknownUnit.body.error.message).toMatch(/unit/i);
    const after = Number(((await t.pool.query('SELECT COUNT(*) AS n FROM readings')) as { n: number }[])[0].n);
    expect(after).toBe(before);
  });

  it('needs a known logger: the file names one, or the person does', async () => {
    const noLogger = await staff.post('/api/imports').attach('file', seriesFile(3), 'n.csv');
    expect(noLogger.status).toBe(400);
    expect(noLogger.body.error.code).toBe('logger_required');
    const unknown = await upload(seriesFile(3), 'n.csv', { logger: 'NOPE-9' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('logger_unknown');
  });

  it('imports with an API token (as the nightly script does) and lists the record with counts', async () => {
    const owner = await signIn(t.app, 'owner@example.com');
    const token = (await owner.post('/api/tokens').send({ name: 'nightly' })).body.token;
    const res = await request(t.app)
      .post('/api/imports')
      .set('authorization', `Bearer ${token}`)
      .field('logger', 'IMP-1')
      .attach('file', seriesFile(5, Date.UTC(2027, 0, 1)), 'nightly.csv');
    expect(res.status).toBe(201);
    const listed = (await staff.get('/api/imports')).body as { id: number; fileName: string; rows: { accepted: number } }[];
    const mine = listed.find((i) => i.id === res.body.import.id)!;
    expect(mine).toMatchObject({ fileName: 'nightly.csv', rows: { accepted: 5 } });
    const detail = await staff.get(`/api/imports/${mine.id}`);
    expect(detail.body.detected.delimiter).toBe(',');
  });
});
