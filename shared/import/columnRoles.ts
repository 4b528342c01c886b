import { readTemperatureCell } from './cellValues';
import { namesHumidity, namesIndex, namesTemperature, namesTime } from './columnNames';
import { shapeOf, type CellShape, type DateStyle } from './writtenTimePatterns';
import { ImportError } from './importError';
import type { DateOrder, TemperatureColumnSource } from './types';

export type TimestampPlan =
  | { kind: 'datetime'; column: number; style: DateStyle; order: DateOrder | null }
  | { kind: 'date+time'; dateColumn: number; timeColumn: number; style: DateStyle; order: DateOrder | null }
  | { kind: 'epoch'; column: number; unit: 's' | 'ms' };

export interface ColumnRoles {
  columns: string[];
  timestamp: TimestampPlan;
  temperatureColumn: number;
  temperatureSource: TemperatureColumnSource;
  humidityColumn: number | null;
}

/** A column counts as holding something when at least half its non-empty sample cells do. */
const ENOUGH = 0.5;

/**
 * Tells which column is which from the header names (when there is a header) and the shapes of the
 * sample values. The timestamp is found by its values; the temperature by its name, or, with no
 * header, as the first numeric column after the timestamp.
 */
export function findColumnRoles(header: string[] | null, dataRows: string[][]): ColumnRoles {
  const width = Math.max(header?.length ?? 0, ...dataRows.map((row) => row.length));
  const columns = Array.from({ length: width }, (_, j) => header?.[j] || `column ${j + 1}`);
  const shapes = dataRows.map((row) => row.map(shapeOf));
  const timestamp = findTimestamp(shapes, header, width);
  const timeColumns = timestamp.kind === 'date+time' ? [timestamp.dateColumn, timestamp.timeColumn] : [timestamp.column];
  const isFree = (j: number) => !timeColumns.includes(j);
  const numeric = (j: number) => isFree(j) && share(dataRows, j, isReadingCell) >= ENOUGH && !isCountingColumn(dataRows, j);

  let temperatureColumn = -1;
  let temperatureSource: TemperatureColumnSource = 'header';
  if (header) {
    temperatureColumn = columns.findIndex((name, j) => isFree(j) && namesTemperature(name));
    if (temperatureColumn === -1) {
      const unnamed = columns
        .map((_, j) => j)
        .filter((j) => numeric(j) && !namesHumidity(columns[j]) && !namesIndex(columns[j]));
      if (unnamed.length === 1) {
        temperatureColumn = unnamed[0];
        temperatureSource = 'only numeric column';
      }
    }
  } else {
    const after = Math.max(...timeColumns);
    const candidates = columns.map((_, j) => j).filter(numeric);
    temperatureColumn = candidates.find((j) => j > after) ?? candidates[0] ?? -1;
    temperatureSource = 'position (no header)';
  }
  if (temperatureColumn === -1) {
    throw new ImportError(
      'no_temperature',
      `No column can be told to be the temperature (columns: ${columns.map((name) => `"${name}"`).join(', ')}). ` +
        'Name the temperature column in the header, e.g. "Temperature (°C)".',
    );
  }
  const humidityColumn = header
    ? columns.findIndex((name, j) => isFree(j) && j !== temperatureColumn && namesHumidity(name))
    : -1;
  return {
    columns,
    timestamp,
    temperatureColumn,
    temperatureSource,
    humidityColumn: humidityColumn === -1 ? null : humidityColumn,
  };
}

function isReadingCell(cell: string): boolean {
  const kind = readTemperatureCell(cell).kind;
  return kind === 'number' || kind === 'sensor code';
}

function share(rows: string[][], column: number, test: (cell: string) => boolean): number {
  let filled = 0;
  let passing = 0;
  for (const row of rows) {
    const cell = row[column];
    if (cell === undefined || cell.trim() === '') continue;
    filled++;
    if (test(cell)) passing++;
  }
  return filled === 0 ? 0 : passing / filled;
}

/** A record-number column (1, 2, 3 …) is numeric but is not a reading. */
function isCountingColumn(rows: string[][], column: number): boolean {
  if (rows.length < 2) return false;
  let previous = Number.NaN;
  for (const row of rows) {
    const cell = row[column]?.trim() ?? '';
    if (!/^\d+$/.test(cell)) return false;
    const value = Number(cell);
    if (!Number.isNaN(previous) && value !== previous + 1) return false;
    previous = value;
  }
  return true;
}

function findTimestamp(shapes: CellShape[][], header: string[] | null, width: number): TimestampPlan {
  const shareOf = (j: number, test: (shape: CellShape) => boolean) => {
    let filled = 0;
    let passing = 0;
    for (const row of shapes) {
      if (row[j] === undefined) continue;
      filled++;
      if (test(row[j])) passing++;
    }
    return filled === 0 ? 0 : passing / filled;
  };
  const best = (test: (shape: CellShape) => boolean): number => {
    let chosen = -1;
    let chosenShare = 0;
    for (let j = 0; j < width; j++) {
      const value = shareOf(j, test) + (header && namesTime(header[j] ?? '') ? 0.01 : 0);
      if (value >= ENOUGH && value > chosenShare) [chosen, chosenShare] = [j, value];
    }
    return chosen;
  };
  const styleOf = (j: number, kind: 'datetime' | 'date'): DateStyle =>
    shareOf(j, (shape) => shape === `${kind} year-first`) >= shareOf(j, (shape) => shape === `${kind} year-last`)
      ? 'year-first'
      : 'year-last';

  const dateTimeColumn = best((shape) => shape.startsWith('datetime'));
  if (dateTimeColumn !== -1) return { kind: 'datetime', column: dateTimeColumn, style: styleOf(dateTimeColumn, 'datetime'), order: null };

  const dateColumn = best((shape) => shape.startsWith('date '));
  if (dateColumn !== -1) {
    const timeColumns = Array.from({ length: width }, (_, j) => j).filter(
      (j) => j !== dateColumn && shareOf(j, (shape) => shape === 'time') >= ENOUGH,
    );
    const timeColumn = timeColumns.includes(dateColumn + 1) ? dateColumn + 1 : timeColumns[0];
    if (timeColumn !== undefined) {
      return { kind: 'date+time', dateColumn, timeColumn, style: styleOf(dateColumn, 'date'), order: null };
    }
  }

  const epochColumn = best((shape) => shape === 'epoch-s' || shape === 'epoch-ms');
  if (epochColumn !== -1) {
    const unit = shareOf(epochColumn, (shape) => shape === 'epoch-ms') > shareOf(epochColumn, (shape) => shape === 'epoch-s') ? 'ms' : 's';
    return { kind: 'epoch', column: epochColumn, unit };
  }
  throw new ImportError(
    'no_timestamp',
    'No column holds dates and times the reader understands. Timestamps may be ISO 8601, day/month/year or ' +
      'month/day/year dates with a time, separate date and time columns, or Unix seconds or milliseconds.',
  );
}
