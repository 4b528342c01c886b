import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ImportError } from '../../../shared/import/importError';
import { readLoggerFile } from '../../../shared/import/readLoggerFile';
import type { Reading, ReadOptions } from '../../../shared/import/types';
import { segmentsSource, wholeFile, type FileSegments } from '../../../server/imports/fileSegments';
import { unpackReadings } from '../../../server/imports/packedReadings';
import { startReader } from '../../../server/imports/readerThread';

const samples = join(import.meta.dirname, '..', '..', '..', 'samples');
const options: ReadOptions = { defaultZone: 'America/New_York' };

async function inThread(file: FileSegments, opts: ReadOptions = options) {
  const readings: Reading[] = [];
  const summary = await startReader().read({ file, options: opts }, async (batch) => {
    readings.push(...unpackReadings(batch));
  });
  return { summary, readings };
}

async function inProcess(file: FileSegments, opts: ReadOptions = options) {
  const readings: Reading[] = [];
  const summary = await readLoggerFile(segmentsSource(file), opts, async (batch) => {
    readings.push(...batch);
  });
  return { summary, readings };
}

describe('reading a logger file on the reader thread', () => {
  let dir: string;
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'ck-reader-thread-'));
  });
  afterAll(() => rm(dir, { recursive: true, force: true }));

  it.each(['root-cellar-new-york-dst.csv', 'crisper-fridge-bad-rows.csv', 'callus-room-latin1-semicolon.csv'])(
    'gives exactly what the reader gives in-process: %s',
    async (name) => {
      const file = wholeFile(join(samples, name));
      expect(await inThread(file)).toEqual(await inProcess(file));
    },
  );

  it('reads the header and then only the byte ranges asked for (a re-export’s new part)', async () => {
    const path = join(dir, 'appended.csv');
    const lines = ['time,temperature °C', '2026-01-01T00:00:00Z,3.0', '2026-01-01T00:10:00Z,3.5', '2026-01-01T00:20:00Z,4.0'];
    await writeFile(path, `${lines.join('\n')}\n`);
    const headEnd = lines[0].length + 1;
    const newPart = headEnd + lines[1].length + 1 + lines[2].length + 1;
    const { readings } = await inThread({ path, segments: [{ start: 0, end: headEnd }, { start: newPart }] }, { defaultZone: 'UTC' });
    expect(readings.map((r) => [new Date(r.t).toISOString(), r.c])).toEqual([['2026-01-01T00:20:00.000Z', 4]]);
  });

  it('passes a reader error on with its code and advice', async () => {
    const path = join(dir, 'empty-rows.csv');
    await writeFile(path, 'time,temperature °C\n\n\n');
    const failure = await inThread(wholeFile(path)).catch((err: unknown) => err);
    expect(failure).toBeInstanceOf(ImportError);
    expect(failure).toMatchObject({ code: 'no_data' });
  });

  it('stops when the import refuses the layout, and the next file still reads', async () => {
    const file = wholeFile(join(samples, 'root-cellar-k01-iso.csv'));
    const refused = new Error('no such logger');
    let batches = 0;
    const outcome = startReader().read({ file, options }, async () => {
      batches++;
    }, {
      onDetected: async () => {
        throw refused;
      },
    });
    await expect(outcome).rejects.toBe(refused);
    expect(batches).toBe(0);
    expect((await inThread(file)).summary.rows.accepted).toBeGreaterThan(0);
  });

  it('a reader stopped before it is given a file ends quietly', async () => {
    const reader = startReader();
    reader.stop();
    reader.stop();
    await expect(reader.read({ file: wholeFile(join(samples, 'root-cellar-k01-iso.csv')), options }, async () => {})).rejects.toThrow(/stopped/);
  });

  it('reads two files at once on two threads', async () => {
    const a = wholeFile(join(samples, 'root-cellar-k01-iso.csv'));
    const b = wholeFile(join(samples, 'north-garage-fahrenheit-mdy.csv'));
    const [ra, rb] = await Promise.all([inThread(a), inThread(b)]);
    expect(ra).toEqual(await inProcess(a));
    expect(rb).toEqual(await inProcess(b));
  });
});
