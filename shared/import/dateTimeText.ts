import type { DateOrder } from './types';

/**
 * Reading the date and time text loggers write. Year-first dates follow ISO 8601 (extended format,
 * "2024-01-05T10:30:00+01:00"; separators '/' and '.' are accepted too); year-last dates ("05.01.2024",
 * "1/5/2024") need a day/month order. The result is the wall-clock time as if it were UTC
 * ("local ms") plus the offset, if one was written; zone arithmetic happens elsewhere.
 */

const DATE_YEAR_FIRST = String.raw`(\d{4})([-/.])(\d{1,2})\2(\d{1,2})`;
const DATE_YEAR_LAST = String.raw`(\d{1,2})([-/.])(\d{1,2})\2(\d{4}|\d{2})`;
const TIME = String.raw`(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?(?:\s*([AaPp])\.?[Mm]\.?)?`;
const OFFSET = String.raw`(?:\s*(Z|[+-]\d{2}(?::?\d{2})?|UTC|GMT))?`;
const BETWEEN = String.raw`(?:\s*T\s*|\s+|,\s*)`;

const DATETIME_YEAR_FIRST = new RegExp(`^\\s*${DATE_YEAR_FIRST}${BETWEEN}${TIME}${OFFSET}\\s*$`);
const DATETIME_YEAR_LAST = new RegExp(`^\\s*${DATE_YEAR_LAST}${BETWEEN}${TIME}${OFFSET}\\s*$`);
const DATE_ONLY_YEAR_FIRST = new RegExp(`^\\s*${DATE_YEAR_FIRST}\\s*$`);
const DATE_ONLY_YEAR_LAST = new RegExp(`^\\s*${DATE_YEAR_LAST}\\s*$`);
const TIME_ONLY = new RegExp(`^\\s*${TIME}${OFFSET}\\s*$`);
const EPOCH = /^\s*(\d{9,13})(?:\.(\d{1,6}))?\s*$/;

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
  if (DATETIME_YEAR_FIRST.test(text)) return 'datetime year-first';
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

/** A wall-clock time read from text; `offsetMinutes` is null when the text carries no offset. */
export interface WrittenTime {
  localMs: number;
  offsetMinutes: number | null;
}

/** Either the time, or the reason the text is not one. */
export type WrittenTimeOutcome = WrittenTime | string;

/** The two numbers before the year in a year-last date, for telling the day/month order. */
export function leadingDateParts(text: string): [number, number] | null {
  const match = DATETIME_YEAR_LAST.exec(text) ?? DATE_ONLY_YEAR_LAST.exec(text);
  return match ? [Number(match[1]), Number(match[3])] : null;
}

export function readDateTime(text: string, style: DateStyle, order: DateOrder): WrittenTimeOutcome {
  if (style === 'year-first') {
    const quick = readIsoQuickly(text);
    if (quick !== null) return quick;
  }
  const match = (style === 'year-first' ? DATETIME_YEAR_FIRST : DATETIME_YEAR_LAST).exec(text);
  if (!match) return notATime(text);
  const date = calendarDate(match, style, order);
  if (typeof date === 'string') return date;
  return withTimeOfDay(date, match, 5, text);
}

const ZERO = 48;

/** The digit at a position, or -1. */
function digitAt(text: string, at: number): number {
  const code = text.charCodeAt(at) - ZERO;
  return code >= 0 && code <= 9 ? code : -1;
}

/** A run of `count` digits as a number, or -1. */
function digitsAt(text: string, at: number, count: number): number {
  let value = 0;
  for (let i = 0; i < count; i++) {
    const digit = digitAt(text, at + i);
    if (digit < 0) return -1;
    value = value * 10 + digit;
  }
  return value;
}

/**
 * The common ISO 8601 layout "YYYY-MM-DD[T ]HH:MM[:SS[.fff]][Z|±HH[:MM]]" read by character position,
 * several times faster than the general pattern on a million rows. Null means "not this exact layout,
 * or not a valid time": the general pattern then reads it, or explains what is wrong with it.
 */
function readIsoQuickly(text: string): WrittenTime | null {
  const length = text.length;
  if (length < 16 || text[4] !== '-' || text[7] !== '-' || text[13] !== ':') return null;
  const between = text[10];
  if (between !== 'T' && between !== ' ') return null;
  const year = digitsAt(text, 0, 4);
  const month = digitsAt(text, 5, 2);
  const day = digitsAt(text, 8, 2);
  const hour = digitsAt(text, 11, 2);
  const minute = digitsAt(text, 14, 2);
  if (year < 0 || month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month) || hour < 0 || hour > 23 || minute < 0 || minute > 59) {
    return null;
  }
  let at = 16;
  let second = 0;
  let millis = 0;
  if (text[at] === ':') {
    second = digitsAt(text, at + 1, 2);
    if (second < 0 || second > 59) return null;
    at += 3;
    if (text[at] === '.' || text[at] === ',') {
      const start = ++at;
      while (digitAt(text, at) >= 0) at++;
      const count = at - start;
      if (count === 0 || count > 9) return null;
      millis = count >= 3 ? digitsAt(text, start, 3) : digitsAt(text, start, count) * (count === 1 ? 100 : 10);
    }
  }
  let offsetMinutes: number | null = null;
  if (at < length) {
    const sign = text[at];
    if (sign === 'Z' && at + 1 === length) offsetMinutes = 0;
    else if (sign === '+' || sign === '-') {
      const hours = digitsAt(text, at + 1, 2);
      const minuteAt = text[at + 3] === ':' ? at + 4 : at + 3;
      const minutes = minuteAt < length ? digitsAt(text, minuteAt, 2) : 0;
      const end = minuteAt < length ? minuteAt + 2 : at + 3;
      if (hours < 0 || minutes < 0 || end !== length) return null;
      offsetMinutes = (sign === '-' ? -1 : 1) * (hours * 60 + minutes);
    } else return null;
  }
  const localMs = Date.UTC(year, month - 1, day, hour, minute, second, millis);
  return { localMs, offsetMinutes };
}

export function readDateAndTime(dateText: string, timeText: string, style: DateStyle, order: DateOrder): WrittenTimeOutcome {
  const dateMatch = (style === 'year-first' ? DATE_ONLY_YEAR_FIRST : DATE_ONLY_YEAR_LAST).exec(dateText);
  if (!dateMatch) return notATime(dateText);
  const date = calendarDate(dateMatch, style, order);
  if (typeof date === 'string') return date;
  const timeMatch = TIME_ONLY.exec(timeText);
  if (!timeMatch) return timeText.trim() === '' ? 'missing time of day' : `not a time of day: "${clip(timeText)}"`;
  return withTimeOfDay(date, timeMatch, 1, timeText);
}

/** Unix epoch seconds (fractions allowed) or milliseconds, to UTC ms. */
export function readEpoch(text: string, unit: 's' | 'ms'): number | string {
  const match = EPOCH.exec(text);
  if (!match) return text.trim() === '' ? 'missing time' : `not a Unix time: "${clip(text)}"`;
  if (unit === 'ms') return match[2] ? `not whole milliseconds: "${clip(text)}"` : Number(match[1]);
  const fraction = match[2] ? Number(match[2].padEnd(3, '0').slice(0, 3)) : 0;
  return Number(match[1]) * 1000 + fraction;
}

function notATime(text: string): string {
  return text.trim() === '' ? 'missing time' : `not a date and time in the file's format: "${clip(text)}"`;
}

export function clip(text: string): string {
  const trimmed = text.trim();
  return trimmed.length > 40 ? `${trimmed.slice(0, 40)}…` : trimmed;
}

/** Days since the epoch of a calendar date, or the reason it is not a date. */
function calendarDate(match: RegExpExecArray, style: DateStyle, order: DateOrder): number | string {
  let year: number;
  let month: number;
  let day: number;
  if (style === 'year-first') {
    year = Number(match[1]);
    month = Number(match[3]);
    day = Number(match[4]);
  } else {
    const first = Number(match[1]);
    const second = Number(match[3]);
    const last = Number(match[4]);
    const lastIsTwoDigits = match[4].length === 2;
    if (order === 'ymd') {
      if (!lastIsTwoDigits) return `date ${match[0].trim()} does not have the year first`;
      [year, month, day] = [2000 + first, second, last];
    } else {
      year = lastIsTwoDigits ? 2000 + last : last;
      [day, month] = order === 'dmy' ? [first, second] : [second, first];
    }
  }
  if (month < 1 || month > 12) return `no month ${month} in date "${clip(match[0].split(/[T ,]/)[0])}"`;
  if (day < 1 || day > daysInMonth(year, month)) return `no day ${day} in month ${month} of ${year}`;
  return Date.UTC(year, month - 1, day) / 86_400_000;
}

function withTimeOfDay(epochDay: number, match: RegExpExecArray, first: number, text: string): WrittenTimeOutcome {
  let hour = Number(match[first]);
  const minute = Number(match[first + 1]);
  const second = match[first + 2] === undefined ? 0 : Number(match[first + 2]);
  const fraction = match[first + 3];
  const meridiem = match[first + 4];
  const offsetText = match[first + 5];
  if (meridiem !== undefined) {
    if (hour < 1 || hour > 12) return `hour ${hour} is not on a 12-hour clock: "${clip(text)}"`;
    const pm = meridiem === 'p' || meridiem === 'P';
    hour = (hour % 12) + (pm ? 12 : 0);
  }
  if (hour > 23 || minute > 59 || second > 59) return `not a valid time of day: "${clip(text)}"`;
  const millis = fraction === undefined ? 0 : Number(fraction.padEnd(3, '0').slice(0, 3));
  const localMs = epochDay * 86_400_000 + ((hour * 60 + minute) * 60 + second) * 1000 + millis;
  return { localMs, offsetMinutes: offsetText === undefined ? null : offsetMinutesOf(offsetText) };
}

/** Files repeat one offset on every row (or two, across a clock change): remember the last one read. */
let lastOffsetText = '';
let lastOffsetMinutes = 0;

/** "+01:00", "+0100", "+01", "Z", "UTC" → minutes east of UTC (ISO 8601 time-zone designators). */
function offsetMinutesOf(text: string): number {
  if (text === lastOffsetText) return lastOffsetMinutes;
  lastOffsetText = text;
  lastOffsetMinutes = parseOffset(text);
  return lastOffsetMinutes;
}

function parseOffset(text: string): number {
  if (text === 'Z' || text === 'UTC' || text === 'GMT') return 0;
  const sign = text[0] === '-' ? -1 : 1;
  const digits = text.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4) || '0'));
}

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysInMonth(year: number, month: number): number {
  if (month === 2 && (year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0))) return 29;
  return DAYS_IN_MONTH[month - 1];
}

/** Describes the written format for the report, from one sample of it. */
export function describeFormat(sample: string, shape: CellShape, order: DateOrder | null): string {
  const datePart = (sep: string, twoDigitYear: boolean): string => {
    const year = twoDigitYear ? 'YY' : 'YYYY';
    if (shape.endsWith('year-first')) return ['YYYY', 'MM', 'DD'].join(sep);
    if (order === 'ymd') return [year, 'MM', 'DD'].join(sep);
    return (order === 'mdy' ? ['MM', 'DD', year] : order === 'dmy' ? ['DD', 'MM', year] : ['??', '??', year]).join(sep);
  };
  const timePart = (match: RegExpExecArray, first: number): string => {
    const twelve = match[first + 4] !== undefined;
    let text = `${twelve ? 'hh' : 'HH'}:mm`;
    if (match[first + 2] !== undefined) text += ':ss';
    if (match[first + 3] !== undefined) text += `.${'S'.repeat(match[first + 3].length)}`;
    if (twelve) text += ' AM/PM';
    const offset = match[first + 5];
    if (offset !== undefined) text += offset === 'Z' ? 'Z' : /^[+-]/.test(offset) ? '±HH:MM' : ` ${offset}`;
    return text;
  };
  if (shape === 'epoch-s') return 'Unix seconds';
  if (shape === 'epoch-ms') return 'Unix milliseconds';
  if (shape === 'time') {
    const match = TIME_ONLY.exec(sample);
    return match ? timePart(match, 1) : '';
  }
  const isDateTime = shape.startsWith('datetime');
  const yearFirst = shape.endsWith('year-first');
  const regex = isDateTime
    ? yearFirst ? DATETIME_YEAR_FIRST : DATETIME_YEAR_LAST
    : yearFirst ? DATE_ONLY_YEAR_FIRST : DATE_ONLY_YEAR_LAST;
  const match = regex.exec(sample);
  if (!match) return '';
  const date = datePart(match[2], !yearFirst && match[4].length === 2);
  if (!isDateTime) return date;
  const between = /^\s*[\d\-/.]+(\s*T\s*|,\s*|\s+)\d/.exec(sample);
  const sep = between ? between[1] : ' ';
  return `${date}${sep.includes('T') ? 'T' : sep.includes(',') ? ', ' : ' '}${timePart(match, 5)}`;
}

/** True when the text has an AM/PM marker (12-hour clock). */
export function hasMeridiem(text: string): boolean {
  return /\d\s*[AaPp]\.?[Mm]\.?\s*(?:Z|[+-]\d{2}(?::?\d{2})?|UTC|GMT)?\s*$/.test(text);
}

/** True when the text carries an explicit UTC offset or Z. */
export function hasWrittenOffset(text: string): boolean {
  const match = DATETIME_YEAR_FIRST.exec(text) ?? DATETIME_YEAR_LAST.exec(text);
  if (match) return match[10] !== undefined;
  const time = TIME_ONLY.exec(text);
  return time ? time[6] !== undefined : false;
}
