import { celsiusIntervalToFahrenheit, fahrenheitIntervalToCelsius } from '../../shared/units';
import type { AlertThresholds } from '../../shared/schemas/alerts';
import type { TemperatureUnit } from '../../shared/schemas/common';

export type ThresholdKey = keyof AlertThresholds;

export interface ThresholdField {
  key: ThresholdKey;
  label: string;
  /** How the value is entered: minutes, hours, degree-hours (in the reader's unit), or an hour of the day. */
  unit: 'min' | 'h' | 'degree-hours' | 'hour';
  hint: string;
}

export const THRESHOLD_FIELDS: ThresholdField[] = [
  { key: 'holdMinutes', label: 'Hold before an alert', unit: 'min', hint: 'A condition must last this long, so one stray reading wakes nobody.' },
  { key: 'freezeTrendHours', label: 'Freeze trend window', unit: 'h', hint: 'The straight-line trend is fitted to this many hours of readings.' },
  { key: 'freezeLookaheadHours', label: 'Freeze look-ahead', unit: 'h', hint: 'Warn when the trend reaches the freeze limit within this time.' },
  { key: 'outOfBandHours', label: 'Allowed outside the band', unit: 'h', hint: 'Hours below or above a batch\'s band within the last 24 h before it is reported.' },
  { key: 'storageWarmMinutes', label: 'Warm time before a storage alert', unit: 'min', hint: 'Minutes above the cold-storage limit before it is reported.' },
  { key: 'silentHours', label: 'Silence allowed', unit: 'h', hint: 'A logger with no newer reading is reported silent: a missed nightly import or a flat battery.' },
  { key: 'exposureBudgetDegreeHours', label: 'Exposure budget', unit: 'degree-hours', hint: 'Degree-hours outside its band a batch may take in storage before it is reported.' },
  { key: 'reminderHours', label: 'Reminder after', unit: 'h', hint: 'An alert nobody has acknowledged is sent again after this long.' },
  { key: 'digestHour', label: 'Daily digest at', unit: 'hour', hint: 'Hour of the day on the nursery\'s clock (0–23).' },
];

export const ROOM_FIELDS = THRESHOLD_FIELDS.filter((f) => f.key !== 'digestHour');

/** Degree-hours are stored in °C·h and shown in the reader's unit, converted as an interval (no offset). */
export const toShown = (key: ThresholdKey, value: number, unit: TemperatureUnit) =>
  key === 'exposureBudgetDegreeHours' && unit === 'F' ? celsiusIntervalToFahrenheit(value) : value;
export const fromShown = (key: ThresholdKey, value: number, unit: TemperatureUnit) =>
  key === 'exposureBudgetDegreeHours' && unit === 'F' ? fahrenheitIntervalToCelsius(value) : value;

export function unitLabel(f: ThresholdField, unit: TemperatureUnit): string {
  if (f.unit === 'degree-hours') return `°${unit}·h`;
  return f.unit === 'hour' ? 'h (0–23)' : f.unit;
}

/** "15 min", "26 h", "18 °F·h", "off". */
export function describeThreshold(f: ThresholdField, value: number | null, unit: TemperatureUnit): string {
  if (value === null) return 'off';
  return `${Math.round(toShown(f.key, value, unit) * 100) / 100} ${unitLabel(f, unit)}`;
}
