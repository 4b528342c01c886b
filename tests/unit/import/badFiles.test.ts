import { createReadStream } from 'node:fs';
import { mkdtemp, open, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readLoggerFile } from '../../../shared/import/readLoggerFile';
import { importErrorOf } from './readText';

const fixture = (name: string) => new URL(`../../fixtures/import/${name}`, import.meta.url).pathname;
const readPath = (path: string, maxLineBytes?: number) =>
  readLoggerFile(() => createReadStream(path), { defaultZone: 'UTC', maxLineBytes }, async () => {});

describe('files that cannot be read stop with a clear error code', () => {
  it.each([
    ['empty.csv', 'empty', 'empty'],
    ['blank-lines.csv', 'empty', 'empty'],
    ['header-only.csv', 'no_data', 'no readings'],
    ['random-bytes.bin', 'binary', 'binary bytes'],
    ['workbook.xlsx', 'binary', 'spreadsheet workbook'],
    ['pipe-delimited.csv', 'no_delimiter', 'comma, semicolon or tab'],
    ['no-timestamp.csv', 'no_timestamp', 'date and time'],
    ['no-temperature.csv', 'no_temperature', 'Battery V'],
    ['all-invalid.csv', 'nothing_readable', 'line 2: sensor error code "ERR"'],
    ['mixed-units.csv', 'mixed_units', 'both °C and °F'],
    ['broken-quote.csv', 'malformed_csv', 'Line 3'],
  ])('%s → %s', async (name, code, hint) => {
    const error = await importErrorOf(readPath(fixture(name)));
    expect(error.code).toBe(code);
    expect(error.message).toContain(hint);
  });

  it('a file that does not exist is unreadable', async () => {
    const error = await importErrorOf(readPath(fixture('no-such-file.csv')));
    expect(error.code).toBe('unreadable');
    expect(error.message).toContain('ENOENT');
  });
});

describe('a 50 MB line', () => {
  let dir = '';
  const FIFTY_MB = 50 * 1024 * 1024;

  /** Writes `before`, then one 50 MB line, then `after`, without building 50 MB strings twice. */
  async function writeWithLongLine(name: string, before: string, after: string): Promise<string> {
    const path = join(dir, name);
    const file = await open(path, 'w');
    await file.write(before);
    const block = Buffer.alloc(1024 * 1024, '7');
    for (let written = 0; written < FIFTY_MB; written += block.length) await file.write(block);
    await file.write(after);
    await file.close();
    return path;
  }

  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'coldknit-long-line-'));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('as the first line: refused after reading about 1 MiB, not 50 MB', async () => {
    const path = await writeWithLongLine('first.csv', '', '\n2025-01-13 08:00,3.5\n');
    const error = await importErrorOf(readPath(path));
    expect(error.code).toBe('line_too_long');
    expect(error.message).toContain('Line 1');
  });

  it('below a header and good rows: csv-parse max_record_size stops it with its line number', async () => {
    const rows = Array.from({ length: 3000 }, (_, i) => `2025-01-13 ${String(Math.floor(i / 60) % 24).padStart(2, '0')}:${String(i % 60).padStart(2, '0')}:${String(Math.floor(i / 1440)).padStart(2, '0')},3.5`);
    const path = await writeWithLongLine('later.csv', `Time,Temp °C\n${rows.join('\n')}\n2025-01-14 08:00,`, '\n');
    const error = await importErrorOf(readPath(path));
    expect(error.code).toBe('line_too_long');
    expect(error.message).toContain(`Line ${rows.length + 2}`);
  });

  it('honours a smaller maxLineBytes', async () => {
    const path = await writeWithLongLine('small-limit.csv', 'Time,Temp °C\n2025-01-13 08:00,3.5\n2025-01-13 08:10,', '\n');
    const error = await importErrorOf(readPath(path, 64 * 1024));
    expect(error.code).toBe('line_too_long');
    expect(error.message).toContain('65536 bytes');
  });
});
