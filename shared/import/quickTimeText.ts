import type { WrittenTime } from './dateTimeText';
import type { DateOrder } from './types';
import { daysInMonth, type DateStyle } from './writtenTimePatterns';

/**
 * The zero-padded layouts most loggers write — "2024-01-05T10:30:00+01:00", "05.01.2024 10:30",
 * "2024-01-05" beside "10:30:00" — read by character position, several times faster than the general
 * patterns on a million rows (measured). Null means "not exactly this layout, or not a valid time":
 * the general patterns then read the text, or explain what is wrong with it. 12-hour times, one-digit
 * fields and spaces before an offset always take that path.
 */

const ZERO = 48;
const DAY = 86_400_000;

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

export function readDateTimeQuickly(text: string, style: DateStyle, order: DateOrder): WrittenTime | null {
  if (text.length < 16 || (text[10] !== 'T' && text[10] !== ' ')) return null;
  const epochDay = dateAt(text, style, order);
  return epochDay < 0 ? null : timeOfDayFrom(text, 11, epochDay);
}

export function readDateAndTimeQuickly(dateText: string, timeText: string, style: DateStyle, order: DateOrder): WrittenTime | null {
  if (dateText.length !== 10) return null;
  const epochDay = dateAt(dateText, style, order);
  return epochDay < 0 ? null : timeOfDayFrom(timeText, 0, epochDay);
}

function isDateSeparator(ch: string): boolean {
  return ch === '-' || ch === '/' || ch === '.';
}

/** Days since 1970-01-01 of the 10-character date at the start of the text, or -1. */
function dateAt(text: string, style: DateStyle, order: DateOrder): number {
  let year: number;
  let month: number;
  let day: number;
  if (style === 'year-first') {
    if (!isDateSeparator(text[4]) || text[7] !== text[4]) return -1;
    year = digitsAt(text, 0, 4);
    month = digitsAt(text, 5, 2);
    day = digitsAt(text, 8, 2);
  } else {
    if (order === 'ymd' || !isDateSeparator(text[2]) || text[5] !== text[2]) return -1;
    const first = digitsAt(text, 0, 2);
    const second = digitsAt(text, 3, 2);
    year = digitsAt(text, 6, 4);
    day = order === 'dmy' ? first : second;
    month = order === 'dmy' ? second : first;
  }
  if (year < 0 || month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return -1;
  return Date.UTC(year, month - 1, day) / DAY;
}

/** "HH:MM[:SS[.f…]][Z|±HH[:MM]]" from `at` to the end of the text. */
function timeOfDayFrom(text: string, at: number, epochDay: number): WrittenTime | null {
  const length = text.length;
  if (text[at + 2] !== ':') return null;
  const hour = digitsAt(text, at, 2);
  const minute = digitsAt(text, at + 3, 2);
  if (hour < 0 || hour > 23 || minute < 0 || minute > 59) return null;
  let next = at + 5;
  let second = 0;
  let millis = 0;
  if (text[next] === ':') {
    second = digitsAt(text, next + 1, 2);
    if (second < 0 || second > 59) return null;
    next += 3;
    if (text[next] === '.' || text[next] === ',') {
      const start = ++next;
      while (digitAt(text, next) >= 0) next++;
      const count = next - start;
      if (count === 0 || count > 9) return null;
      millis = count >= 3 ? digitsAt(text, start, 3) : digitsAt(text, start, count) * (count === 1 ? 100 : 10);
    }
  }
  let offsetMinutes: number | null = null;
  if (next < length) {
    offsetMinutes = offsetFrom(text, next);
    if (offsetMinutes === null) return null;
  }
  return { localMs: epochDay * DAY + ((hour * 60 + minute) * 60 + second) * 1000 + millis, offsetMinutes };
}

/** "Z", "±HH", "±HHMM" or "±HH:MM" filling the rest of the text (ISO 8601 time-zone designators), else null. */
function offsetFrom(text: string, at: number): number | null {
  const length = text.length;
  const sign = text[at];
  if (sign === 'Z') return at + 1 === length ? 0 : null;
  if (sign !== '+' && sign !== '-') return null;
  const hours = digitsAt(text, at + 1, 2);
  const minuteAt = text[at + 3] === ':' ? at + 4 : at + 3;
  const minutes = minuteAt < length ? digitsAt(text, minuteAt, 2) : 0;
  const end = minuteAt < length ? minuteAt + 2 : at + 3;
  if (hours < 0 || minutes < 0 || end !== length) return null;
  return (sign === '-' ? -1 : 1) * (hours * 60 + minutes);
}
