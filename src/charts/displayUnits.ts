// Temperatures are stored and sent in °C; each person reads them in the unit of their choice (user.unit).
import type { TemperatureUnit } from '../../shared/schemas/common';
import { celsiusToFahrenheit } from '../../shared/units';

export const UNIT_SYMBOL: Record<TemperatureUnit, string> = { C: '°C', F: '°F' };

export function toDisplay(c: number, unit: TemperatureUnit): number {
  return unit === 'F' ? celsiusToFahrenheit(c) : c;
}

/** "−2.2 °C" / "28.0 °F": one decimal, a true minus sign so a screen reader says "minus". */
export function formatTemperature(c: number, unit: TemperatureUnit, digits = 1): string {
  return `${toDisplay(c, unit).toFixed(digits).replace(/^-/, '−')} ${UNIT_SYMBOL[unit]}`;
}
