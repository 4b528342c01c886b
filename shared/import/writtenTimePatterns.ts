/**
 * The shapes of date and time text loggers write. Year-first dates follow ISO 8601 (extended format,
 * "2024-01-05T10:30:00+01:00", with '/' and '.' accepted as separators too, or basic format "20240105T103000+0100");
 * year-last dates ("05.01.2024",
 * "1/5/2024") need a day/month order. Group numbers are relied on by the readers and the format report:
 * date 1–4 (first, separator, second, last), then time hour, minute, second, fraction, AM/PM, offset.
 */

const DATE_YEAR_FIRST = String.raw`(\d{4})([-/.])(\d{1,2})\2(\d{1,2})`;
const DATE_YEAR_LAST = String.raw`(\d{1,2})([-/.])(\d{1,2})\2(\d{4}|\d{2})`;
const TIME = String.raw`(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?(?:\s*([AaPp])\.?[Mm]\.?)?`;
const OFFSET = String.raw`(?:\s*(Z|[+-]\d{2}(?::?\d{2})?|UTC|GMT))?`;
const BETWEEN = String.raw`(?:\s*T\s*|\s+|,\s*)`;

export const DATETIME_YEAR_FIRST = new RegExp(`^\\s*${DATE_YEAR_FIRST}${BETWEEN}${TIME}${OFFSET}\\s*$`);
export const DATETIME_YEAR_LAST = new RegExp(`^\\s*${DATE_YEAR_LAST}${BETWEEN}${TIME}${OFFSET}\\s*$`);
export const DATE_ONLY_YEAR_FIRST = new RegExp(`^\\s*${DATE_YEAR_FIRST}\\s*$`);
export const DATE_ONLY_YEAR_LAST = new RegExp(`^\\s*${DATE_YEAR_LAST}\\s*$`);
export const TIME_ONLY = new RegExp(`^\\s*${TIME}${OFFSET}\\s*$`);
export const EPOCH = /^\s*(\d{9,13})(?:\.(\d{1,6}))?\s*$/;

/** ISO 8601 basic format, date and time together ("20251101T073000Z", "20251101T0730+0100"); the 'T' is required. */
const BASIC = /^\s*(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})?([.,]\d{1,9})?(Z|[+-]\d{2}(?:\d{2})?)?\s*$/;

/**
 * The extended-format spelling of an ISO 8601 basic-format date-time ("20251101T073000Z" → "2025-11-01T07:30:00Z"),
 * else null. Basic format is read by rewriting it, so one set of patterns reads both.
 */
export function basicToExtended(text: string): string | null {
  const m = BASIC.exec(text);
  if (!m) return null;
  const [, year, month, day, hour, minute, second, fraction, offset] = m;
  const zone = offset === undefined || offset === 'Z' ? (offset ?? '') : `${offset.slice(0, 3)}${offset.length > 3 ? `:${offset.slice(3)}` : ''}`;
  return `${year}-${month}-${day}T${hour}:${minute}${second === undefined ? '' : `:${second}`}${fraction ?? ''}${zone}`;
}

/** Unix time from 2000-01-01 to 2100-01-01: wide enough for any logger, narrow enough not to mistake other numbers. */
const EPOCH_S_MIN = 946_684_800;
const EPOCH_S_MAX = 4_102_444_800;

export type DateStyle = 'year-first' | 'year-last';

export type CellShape =
  | 'datetime year-first'
  | 'datetime year-last'
  | 'date year-first'
  | 'date year-last'
  | 'time'
  | 'epoch-s'
  | 'epoch-ms'
  | 'other';

export function shapeOf(text: string): CellShape {
  if (DATETIME_YEAR_FIRST.test(text) || basicToExtended(text) !== null) return 'datetime year-first';
  if (DATETIME_YEAR_LAST.test(text)) return 'datetime year-last';
  if (DATE_ONLY_YEAR_FIRST.test(text)) return 'date year-first';
  if (DATE_ONLY_YEAR_LAST.test(text)) return 'date year-last';
  if (TIME_ONLY.test(text)) return 'time';
  const epoch = EPOCH.exec(text);
  if (epoch) {
    const whole = Number(epoch[1]);
    if (whole >= EPOCH_S_MIN && whole < EPOCH_S_MAX) return 'epoch-s';
    if (!epoch[2] && whole >= EPOCH_S_MIN * 1000 && whole < EPOCH_S_MAX * 1000) return 'epoch-ms';
  }
  return 'other';
}

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

export function daysInMonth(year: number, month: number): number {
  if (month === 2 && (year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0))) return 29;
  return DAYS_IN_MONTH[month - 1];
}
