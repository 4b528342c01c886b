import {
  basicToExtended,
  DATE_ONLY_YEAR_FIRST,
  DATE_ONLY_YEAR_LAST,
  DATETIME_YEAR_FIRST,
  DATETIME_YEAR_LAST,
  TIME_ONLY,
  type CellShape,
} from './writtenTimePatterns';
import type { DateOrder } from './types';

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
  const extended = basicToExtended(sample);
  if (extended !== null) {
    // Basic format: the same parts as the extended spelling, without its separators.
    return describeFormat(extended, shape, order).replace(/[-:]/g, '');
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
  const match = DATETIME_YEAR_FIRST.exec(basicToExtended(text) ?? text) ?? DATETIME_YEAR_LAST.exec(text);
  if (match) return match[10] !== undefined;
  const time = TIME_ONLY.exec(text);
  return time ? time[6] !== undefined : false;
}
