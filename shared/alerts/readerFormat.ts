// Numbers and instants as one reader sees them: their temperature unit, the nursery's clock.
import { celsiusIntervalToFahrenheit, celsiusToFahrenheit } from '../units';
import type { TemperatureUnit } from '../schemas/common';

export interface Reader {
  unit: TemperatureUnit;
  timeZone: string;
}

const MINUS = '\u2212';
const signed = (n: number, digits: number) => (n < 0 ? `${MINUS}${Math.abs(n).toFixed(digits)}` : n.toFixed(digits));

export function temperature(c: number, r: Reader): string {
  return r.unit === 'F' ? `${signed(celsiusToFahrenheit(c), 1)} °F` : `${signed(c, 1)} °C`;
}

/** A rate or difference has no offset: 1 °C of change is 1.8 °F of change (NIST SP 811 B.9). */
export function change(deltaC: number, r: Reader): string {
  const value = r.unit === 'F' ? celsiusIntervalToFahrenheit(deltaC) : deltaC;
  return `${Math.abs(value).toFixed(1)} °${r.unit}`;
}

export function trend(cPerHour: number, r: Reader): string {
  if (Math.abs(cPerHour) < 0.05) return 'steady';
  return `${cPerHour < 0 ? 'falling' : 'rising'} ${change(cPerHour, r)} per hour`;
}

export function degreeHours(dh: number, r: Reader): string {
  const value = r.unit === 'F' ? celsiusIntervalToFahrenheit(dh) : dh;
  return `${value.toFixed(1)} °${r.unit}·h`;
}

export function instant(ms: number, r: Reader): string {
  return new Intl.DateTimeFormat('en-GB', {
    timeZone: r.timeZone, weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', timeZoneName: 'short',
  }).format(new Date(ms));
}

export function hours(h: number): string {
  if (h < 1) return `${Math.round(h * 60)} min`;
  return `${h.toFixed(h < 10 ? 1 : 0)} h`;
}

/** "in 7.5 h" / "now" relative to the evaluation that wrote the message; null once the moment has passed. */
export function fromNow(ms: number, now: number): string | null {
  const h = (ms - now) / 3_600_000;
  if (h < -1 / 60) return null;
  return h <= 1 / 60 ? 'now' : `in ${hours(h)}`;
}
