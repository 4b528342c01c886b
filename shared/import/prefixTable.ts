import { parse } from 'csv-parse/sync';
import { readTemperatureCell } from './cellValues';
import { ImportError } from './importError';
import { shapeOf } from './writtenTimePatterns';
import type { Delimiter } from './types';

/** One non-blank line of the prefix, split into fields; `index` is its 0-based physical line. */
export interface PrefixRow {
  index: number;
  fields: string[];
}

export interface PrefixTable {
  lineEnding: 'LF' | 'CRLF' | 'CR';
  delimiter: Delimiter;
  /** Lines before the header (or before the first data row when there is no header). */
  preambleLines: number;
  /** The header's fields, a units row folded in ("Temp" + "°C" → "Temp °C"); null without a header. */
  header: string[] | null;
  headerLines: number;
  preamble: PrefixRow[];
  /** Data rows of the prefix (rows shaped like readings), in file order. */
  dataRows: PrefixRow[];
}

/** Delimiters in the order they win when more than one splits the rows consistently (see detectDelimiter). */
const CANDIDATES: Delimiter[] = ['\t', ';', ','];

export function lineEndingOf(text: string): PrefixTable['lineEnding'] {
  const lf = text.indexOf('\n');
  if (lf > 0 && text[lf - 1] === '\r') return 'CRLF';
  if (lf !== -1) return 'LF';
  return text.includes('\r') ? 'CR' : 'LF';
}

/** Splits the decoded prefix into physical lines; a prefix cut mid-file loses its unfinished last line. */
export function prefixLines(text: string, lineEnding: PrefixTable['lineEnding'], complete: boolean): string[] {
  const lines = text.split(lineEnding === 'CR' ? '\r' : /\r?\n/);
  if (!complete && lines.length > 1) lines.pop();
  if (complete && lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
  return lines;
}

/**
 * Finds the delimiter as the candidate that splits the last lines (the data, below any preamble) into
 * the same number of fields, two or more. Tab, then semicolon, then comma: a semicolon file whose values
 * use decimal commas also splits consistently on commas, so semicolon must be tried first. csv-parse's
 * own `delimiter_auto` counts characters without regard to quotes or decimal commas, hence this.
 */
function detectDelimiter(lines: string[]): Delimiter {
  const nonBlank = lines.filter((line) => line.trim() !== '');
  for (const delimiter of CANDIDATES) {
    const counts = nonBlank.map((line) => countFields(line, delimiter));
    // The usual width of the last lines that split at all: short files may have more preamble than rows.
    const usual = mode(counts.slice(-10).filter((count) => count >= 2));
    if (usual < 2) continue;
    const start = counts.indexOf(usual);
    const block = counts.slice(start);
    if (block.filter((count) => count === usual).length >= block.length * 0.8) return delimiter;
  }
  throw new ImportError(
    'no_delimiter',
    'No comma, semicolon or tab separates the columns the same way on every line. ' +
      'Export the logger data as CSV (comma or semicolon) or tab-separated text.',
  );
}

/** Fields on a line, counting delimiters outside double quotes (RFC 4180 §2). */
function countFields(line: string, delimiter: string): number {
  let count = 1;
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') quoted = !quoted;
    else if (ch === delimiter && !quoted) count++;
  }
  return count;
}

function mode(values: number[]): number {
  const tally = new Map<number, number>();
  let best = 0;
  let bestCount = 0;
  for (const value of values) {
    const count = (tally.get(value) ?? 0) + 1;
    tally.set(value, count);
    if (count > bestCount || (count === bestCount && value > best)) [best, bestCount] = [value, count];
  }
  return best;
}

/**
 * The prefix as CSV records (RFC 4180: a quoted field may span lines), each with the line it starts on.
 * Null when the quoting is broken somewhere, e.g. a stray quote in a preamble line.
 */
function wholeRecords(lines: string[], delimiter: Delimiter): PrefixRow[] | null {
  try {
    const records = parse(lines.join('\n'), { ...SPLIT_OPTIONS, delimiter, record_delimiter: '\n', info: true }) as unknown as {
      record: string[];
      info: { lines: number };
    }[];
    return records
      // info.lines is the line a record ends on; a record spanning k lines started k − 1 lines earlier.
      .map(({ record, info }) => ({ index: info.lines - record.join('').split('\n').length, fields: record }))
      .filter((row) => row.fields.some((field) => field.trim() !== ''));
  } catch {
    return null;
  }
}

/** Line by line, keeping a line whose quotes do not parse as one field (it is not data anyway). */
function lineByLine(lines: string[], delimiter: Delimiter): PrefixRow[] {
  const rows: PrefixRow[] = [];
  lines.forEach((line, index) => {
    if (line.trim() === '') return;
    try {
      const [fields] = parse(line, { ...SPLIT_OPTIONS, delimiter }) as string[][];
      rows.push({ index, fields: fields ?? [line] });
    } catch {
      rows.push({ index, fields: [line] });
    }
  });
  return rows;
}

const SPLIT_OPTIONS = { relax_quotes: true, relax_column_count: true, ltrim: true, rtrim: true } as const;

/** A row is shaped like a reading when some cell holds a date-time, a Unix time, or a date beside a time. */
function isDataShaped(fields: string[]): boolean {
  if (fields.length < 2) return false;
  const shapes = fields.map(shapeOf);
  return shapes.some(
    (shape, i) =>
      shape.startsWith('datetime') ||
      shape === 'epoch-s' ||
      shape === 'epoch-ms' ||
      (shape.startsWith('date ') && shapes.some((other, j) => j !== i && other === 'time')),
  );
}

function hasReadingBesideTime(fields: string[]): boolean {
  return fields.some((cell) => shapeOf(cell) === 'other' && readTemperatureCell(cell).kind === 'number');
}

const UNITS_ROW_CELL = /^(?:[°º]?\s*[cf]|deg\s*[cf]|%\s*(?:rh)?|rh|[℃℉]|\(.*\)|\[.*\]|)$/i;

export function readPrefixTable(lines: string[], lineEnding: PrefixTable['lineEnding']): PrefixTable {
  const delimiter = detectDelimiter(lines);
  const rows = wholeRecords(lines, delimiter) ?? lineByLine(lines, delimiter);
  const usualCount = mode(rows.slice(-10).map((row) => row.fields.length).filter((count) => count >= 2));
  // The first row that is surely a reading: usual width, a timestamp, and a number beside it.
  // ("Exported;2024-01-08 09:12" in a preamble has a timestamp but no reading.)
  // A file where every reading is a fault code still has its rows found, by the weaker tests.
  const tests = [
    (row: PrefixRow) => row.fields.length === usualCount && isDataShaped(row.fields) && hasReadingBesideTime(row.fields),
    (row: PrefixRow) => row.fields.length === usualCount && isDataShaped(row.fields),
    (row: PrefixRow) => isDataShaped(row.fields),
  ];
  let firstData = tests.map((test) => rows.findIndex(test)).find((index) => index !== -1) ?? -1;
  // Rows of the same shape just above it are readings too, e.g. a run of "ERR" rows at the start.
  while (firstData > 0 && tests[1](rows[firstData - 1])) firstData--;
  if (firstData === -1) {
    const headerOnly = rows.filter((row) => row.fields.length >= 2).length <= 1;
    throw new ImportError(
      headerOnly ? 'no_data' : 'no_timestamp',
      headerOnly
        ? 'The file has a header but no readings below it. Check that the export contains readings.'
        : 'No line holds a date and time the reader understands. Timestamps may be ISO 8601, day/month/year or month/day/year dates with a time, separate date and time columns, or Unix seconds.',
    );
  }
  let header: string[] | null = null;
  let headerStart = firstData;
  const above = rows[firstData - 1];
  if (above && above.fields.length >= 2 && !isDataShaped(above.fields)) {
    header = above.fields.map((name) => name.trim());
    headerStart = firstData - 1;
    const twoAbove = rows[firstData - 2];
    const isUnitsRow = header.every((cell) => UNITS_ROW_CELL.test(cell));
    if (isUnitsRow && twoAbove && twoAbove.fields.length >= 2) {
      header = twoAbove.fields.map((name, i) => `${name.trim()} ${header?.[i] ?? ''}`.trim());
      headerStart = firstData - 2;
    }
  }
  const preambleLines = rows[headerStart].index;
  const headerEnd = header ? rows[firstData - 1].index + 1 : preambleLines;
  return {
    lineEnding,
    delimiter,
    preambleLines,
    header,
    headerLines: header ? headerEnd - preambleLines : 0,
    preamble: rows.slice(0, headerStart),
    dataRows: rows.slice(firstData).filter((row) => isDataShaped(row.fields)),
  };
}
