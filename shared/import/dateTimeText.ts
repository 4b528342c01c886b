import {
  basicToExtended,
  DATE_ONLY_YEAR_FIRST,
  DATE_ONLY_YEAR_LAST,
  DATETIME_YEAR_FIRST,
  DATETIME_YEAR_LAST,
  daysInMonth,
  EPOCH,
  TIME_ONLY,
  type DateStyle,
} from './writtenTimePatterns';
import { readDateAndTimeQuickly, readDateTimeQuickly } from './quickTimeText';
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
  const quick = readDateTimeQuickly(text, style, order);
  if (quick !== null) return quick;
  const match = style === 'year-first' ? DATETIME_YEAR_FIRST.exec(basicToExtended(text) ?? text) : DATETIME_YEAR_LAST.exec(text);
  if (!match) return notATime(text);
  const date = calendarDate(match, style, order);
  if (typeof date === 'string') return date;
  return withTimeOfDay(date, match, 5, text);
}

export function readDateAndTime(dateText: string, timeText: string, style: DateStyle, order: DateOrder): WrittenTimeOutcome {
  const quick = readDateAndTimeQuickly(dateText, timeText, style, order);
  if (quick !== null) return quick;
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
