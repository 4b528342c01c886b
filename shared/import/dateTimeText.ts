import {
  DATE_ONLY_YEAR_FIRST,
  DATE_ONLY_YEAR_LAST,
  DATETIME_YEAR_FIRST,
  DATETIME_YEAR_LAST,
  daysInMonth,
  EPOCH,
  TIME_ONLY,
  type DateStyle,
} from './writtenTimePatterns';
import type { DateOrder } from './types';

/**
 * Reads date and time text into the wall-clock time as if it were UTC ("local ms") plus the offset,
 * if one was written; zone arithmetic happens elsewhere (localTime.ts).
 */

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
