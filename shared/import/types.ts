/** Public shapes of the logger-file reader, shared by server, CLI and tests. */

export type TemperatureUnit = 'C' | 'F';
export type DateOrder = 'dmy' | 'mdy' | 'ymd';

export interface ReadOptions {
  /** IANA zone ("Europe/Berlin") or fixed offset ("+01:00", "UTC") for timestamps written without an offset. */
  tz?: string;
  /** Temperature unit, when the file does not say it (or to overrule what it says). */
  unit?: TemperatureUnit;
  /** Day/month order for dates such as 03/04/2024. */
  dateOrder?: DateOrder;
  /** Zone used when neither the timestamps nor `tz` give one (the caller's: machine zone, room zone…). */
  defaultZone: string;
  /** Longest line accepted, in bytes (characters after decoding). Default 1 MiB. */
  maxLineBytes?: number;
  /** Readings handed to onBatch at a time. Default 5,000. */
  batchSize?: number;
}

/** One accepted reading. `t` is epoch milliseconds UTC, `c` degrees Celsius, `line` the physical line (1-based). */
export interface Reading {
  t: number;
  c: number;
  rh: number | null;
  line: number;
}

export type OnBatch = (readings: Reading[]) => Promise<void>;

export type EncodingName = 'utf-8' | 'windows-1252' | 'utf-16le' | 'utf-16be';
export type Delimiter = ',' | ';' | '\t';

export type TimestampKind = 'datetime' | 'date+time' | 'epoch-s' | 'epoch-ms';
/** How the day/month order was settled. */
export type DateOrderSource = 'format' | 'values' | 'series' | 'option';
export type ZoneSource = 'explicit offset' | 'epoch (UTC)' | 'option' | 'default';
export type UnitSource = 'header' | 'values' | 'preamble' | 'option';
export type TemperatureColumnSource = 'header' | 'only numeric column' | 'position (no header)';

export interface TimestampDetection {
  kind: TimestampKind;
  /** One column name, or the date column then the time column. */
  columns: string[];
  /** Human description such as "DD.MM.YYYY HH:mm" or "YYYY-MM-DDTHH:mm:ss±HH:MM". */
  format: string;
  dateOrder: DateOrder | null;
  dateOrderSource: DateOrderSource | null;
  /** True when the order was worked out from the values or the series rather than the format or an option. */
  dateOrderInferred: boolean;
  clock: '24h' | '12h' | null;
  /** Zone name or offset applied to local times, or "explicit offset" / "UTC" when the file carries it. */
  zone: string;
  zoneSource: ZoneSource;
  /** File order of the readings, used to resolve the repeated hour at the autumn change. */
  order: 'ascending' | 'descending';
}

export interface TemperatureDetection {
  column: string;
  columnSource: TemperatureColumnSource;
  unit: TemperatureUnit;
  unitSource: UnitSource;
  /** Set when sources disagreed, e.g. the header says °F but the unit option says C. */
  note: string | null;
}

export interface Detection {
  encoding: EncodingName;
  bom: boolean;
  delimiter: Delimiter;
  decimalComma: boolean;
  lineEnding: 'LF' | 'CRLF' | 'CR';
  preambleLines: number;
  hasHeader: boolean;
  columns: string[];
  timestamp: TimestampDetection;
  temperature: TemperatureDetection;
  humidityColumn: string | null;
  /** A logger serial or label named in the preamble ("Logger: K-01"), if any. */
  loggerHint: string | null;
}

export interface LineNote {
  line: number;
  reason: string;
}

export interface RowCounts {
  total: number;
  accepted: number;
  rejected: number;
  duplicates: number;
  conflicts: number;
}

export interface ReadSummary {
  detected: Detection;
  /** total = accepted + rejected + duplicates + conflicts; blank lines, preamble and header are not rows. */
  rows: RowCounts;
  /** The first MAX_NOTED_LINES rejections; rows.rejected has the full count. */
  rejectedLines: LineNote[];
  /** The first MAX_NOTED_LINES conflicts; rows.conflicts has the full count. */
  conflictLines: LineNote[];
  /** Earliest and latest accepted reading, epoch ms UTC. */
  span: { first: number | null; last: number | null };
}

export const MAX_NOTED_LINES = 1000;
