import type { TemperatureUnit } from './types';

/**
 * Reads one temperature or humidity cell. Both decimal marks are taken: a logger value never has a
 * thousands separator, so "3,5" can only mean 3.5. A unit written in the cell ("3.5 °C") is returned
 * so the caller can check it against the column's unit.
 */
export type CellValue =
  | { kind: 'number'; value: number; unit: TemperatureUnit | null }
  | { kind: 'empty' }
  | { kind: 'sensor code'; text: string }
  | { kind: 'not a number'; text: string };

const PLAIN_NUMBER = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)$/;
const NUMBER_WITH_UNIT = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+))\s*(?:[°º]\s*|deg\s*)?([CF])$/i;
const NUMBER_WITH_SYMBOL = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+))\s*([℃℉])$/;
const NUMBER_WITH_DEGREE = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+))\s*[°º]$/;
const NUMBER_WITH_PERCENT = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+))\s*%\s*(?:rh)?$/i;
/** Placeholders loggers write instead of a reading when the probe fails or is unplugged (common practice). */
const SENSOR_CODE = /^(?:err(?:or)?\s*\d*|e\d{1,3}|-+|n\/?a|nan|null|none|ovf|overflow|open|short|fault|#n\/a|#value!|-?9{3,4}(?:[.,]0+)?|-?999[.,]9)$/i;

function numberFromText(text: string): number {
  return text.includes(',') ? Number(text.replace(',', '.')) : Number(text);
}

export function readTemperatureCell(raw: string): CellValue {
  return readCell(raw, (text) => {
    const withUnit = NUMBER_WITH_UNIT.exec(text);
    if (withUnit) return { kind: 'number', value: numberFromText(withUnit[1]), unit: withUnit[2].toUpperCase() as TemperatureUnit };
    const withSymbol = NUMBER_WITH_SYMBOL.exec(text);
    if (withSymbol) return { kind: 'number', value: numberFromText(withSymbol[1]), unit: withSymbol[2] === '℃' ? 'C' : 'F' };
    // "3.5°": a degree sign alone names no unit; the column's unit applies.
    const withDegree = NUMBER_WITH_DEGREE.exec(text);
    return withDegree ? { kind: 'number', value: numberFromText(withDegree[1]), unit: null } : null;
  });
}

export function readHumidityCell(raw: string): CellValue {
  return readCell(raw, (text) => {
    const withPercent = NUMBER_WITH_PERCENT.exec(text);
    return withPercent ? { kind: 'number', value: numberFromText(withPercent[1]), unit: null } : null;
  });
}

/** Plain numbers first (the common case, and "-999" is one of them but a fault marker), then written units. */
function readCell(raw: string, readWithUnit: (text: string) => CellValue | null): CellValue {
  const text = raw.trim();
  if (text === '') return { kind: 'empty' };
  if (PLAIN_NUMBER.test(text)) {
    const value = numberFromText(text);
    // Only numbers such as -999 or 9999 can be fault markers; most rows skip the second pattern.
    if ((value <= -99 || value >= 999) && SENSOR_CODE.test(text)) return { kind: 'sensor code', text };
    return { kind: 'number', value, unit: null };
  }
  const withUnit = readWithUnit(text);
  if (withUnit) return withUnit;
  if (SENSOR_CODE.test(text)) return { kind: 'sensor code', text };
  return { kind: 'not a number', text };
}

/** True when a cell holds a number written with a decimal comma ("3,5"). */
export function hasDecimalComma(raw: string): boolean {
  return /^\s*[+-]?\d*,\d+/.test(raw);
}

/** Readings outside this range are taken as sensor faults rather than room temperatures (design choice). */
export const PLAUSIBLE_MIN_C = -50;
export const PLAUSIBLE_MAX_C = 70;
