// Exposure figures in words and the reader's unit: hours, degree-hours (an interval: 1 °C·h = 1.8 °F·h), limits.
import type { TemperatureUnit } from '../../shared/schemas/common';
import { celsiusIntervalToFahrenheit } from '../../shared/units';
import { formatTemperature, UNIT_SYMBOL } from '../charts/displayUnits';
import type { LimitFigures } from './queries';

/** "0", "0.4 h", "12 h", "3 d 4 h": short enough for a table cell, exact enough to compare. */
export function hoursText(h: number): string {
  if (h < 0.05) return '0';
  if (h < 10) return `${h.toFixed(1)} h`;
  const whole = Math.round(h);
  if (whole < 72) return `${whole} h`;
  const days = Math.floor(whole / 24);
  return `${days} d ${whole - days * 24} h`;
}

export function degreeHoursText(dh: number, unit: TemperatureUnit): string {
  const value = unit === 'F' ? celsiusIntervalToFahrenheit(dh) : dh;
  return `${value.toFixed(value < 10 ? 1 : 0)} ${UNIT_SYMBOL[unit]}·h`;
}

/** "2.5 h, 3.1 °C·h" or "none" for one limit. */
export function limitText(limit: LimitFigures, unit: TemperatureUnit): string {
  return limit.hours === 0 ? 'none' : `${hoursText(limit.hours)}, ${degreeHoursText(limit.degreeHours, unit)}`;
}

export function rangeText(minC: number | null, maxC: number | null, unit: TemperatureUnit): string {
  return minC === null || maxC === null ? 'no readings' : `${formatTemperature(minC, unit)} to ${formatTemperature(maxC, unit)}`;
}
