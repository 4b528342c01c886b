// Temperature conversion and the temperature specs typed on the command line.
// Conversions follow NIST SP 811 App. B.8/B.9: t/°C = (t/°F − 32)/1.8 exactly, T/K = t/°C + 273.15,
// and a temperature *interval* of 1 °F is 5/9 °C (no offset) — the rule for degree-hours.

export interface TemperatureBand {
  minC: number;
  maxC: number;
}

const KELVIN_OFFSET = 273.15;

export function fahrenheitToCelsius(f: number): number {
  return (f - 32) / 1.8;
}

export function celsiusToFahrenheit(c: number): number {
  return c * 1.8 + 32;
}

export function kelvinToCelsius(k: number): number {
  return k - KELVIN_OFFSET;
}

/** A difference of temperatures (or degree-hours) in °F expressed in °C. */
export function fahrenheitIntervalToCelsius(deltaF: number): number {
  return (deltaF * 5) / 9;
}

/** A difference of temperatures (or degree-hours) in °C expressed in °F. */
export function celsiusIntervalToFahrenheit(deltaC: number): number {
  return (deltaC * 9) / 5;
}

type TemperatureUnit = 'C' | 'F' | 'K';

interface TemperatureSpec {
  value: number;
  unit: TemperatureUnit | null;
}

// A number, then optionally a unit letter with or without a degree sign; spaces allowed between.
const SPEC_PATTERN = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*°?\s*([a-z]*)$/i;

function splitSpec(spec: string): TemperatureSpec {
  const text = spec.trim();
  if (text === '') throw new Error('Empty temperature: give a number such as "-2", "1.5C" or "35F".');
  if (/^[+-]?\d+,\d+/.test(text)) {
    throw new Error(`Temperature "${spec}" uses a decimal comma: write it with a dot, e.g. "${text.replace(',', '.')}".`);
  }
  const match = SPEC_PATTERN.exec(text);
  if (!match) throw new Error(`Temperature "${spec}" is not a number followed by an optional unit (C, F or K).`);
  const value = Number(match[1]);
  if (!Number.isFinite(value)) throw new Error(`Temperature "${spec}" is not a finite number.`);
  const suffix = match[2].toUpperCase();
  if (suffix !== '' && suffix !== 'C' && suffix !== 'F' && suffix !== 'K') {
    throw new Error(`Unknown temperature unit "${match[2]}" in "${spec}": use C, F or K (no unit means °C).`);
  }
  return { value, unit: suffix === '' ? null : suffix };
}

function toCelsius({ value, unit }: TemperatureSpec, original: string): number {
  switch (unit) {
    case 'F':
      return fahrenheitToCelsius(value);
    case 'K':
      if (value < 0) throw new Error(`Temperature "${original}" is below absolute zero.`);
      return kelvinToCelsius(value);
    default:
      return value;
  }
}

/** "35F" → 1.666…, "-2" → -2 (a bare number is °C), "274.15K" → 1. Throws an Error naming the bad input. */
export function parseTemperature(spec: string): number {
  return toCelsius(splitSpec(spec), spec);
}

/**
 * "35F:40F" → {minC: 1.67, maxC: 4.44}. When only one end carries a unit ("35:40F") the other end takes
 * the same unit, as in the usual written form "35–40 °F". The ends may be equal; min above max is an error.
 */
export function parseRange(spec: string): TemperatureBand {
  const parts = spec.split(':');
  if (parts.length !== 2) {
    throw new Error(`Range "${spec}" must be two temperatures separated by a colon, e.g. "35F:40F" or "0:7".`);
  }
  const [low, high] = parts.map(splitSpec);
  // An end without a unit borrows the other end's; two different units ("0C:40F") each convert on their own.
  low.unit ??= high.unit;
  high.unit ??= low.unit;
  const minC = toCelsius(low, parts[0]);
  const maxC = toCelsius(high, parts[1]);
  if (minC > maxC) {
    throw new Error(`Range "${spec}" has its minimum above its maximum (${minC} °C > ${maxC} °C).`);
  }
  return { minC, maxC };
}
