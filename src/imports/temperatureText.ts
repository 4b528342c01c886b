import { celsiusToFahrenheit } from '../../shared/units';

/** A temperature in the reader's preferred unit, to the tenth a logger resolves. */
export function formatTemperature(c: number, unit: 'C' | 'F'): string {
  return unit === 'F' ? `${celsiusToFahrenheit(c).toFixed(1)} °F` : `${c.toFixed(1)} °C`;
}
