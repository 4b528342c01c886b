import { DateTime } from 'luxon';

// Everything a nursery records happens on its own clock, so times show in the nursery's zone, not the browser's.

const STAMP = 'd LLL yyyy, HH:mm';
const INPUT = "yyyy-MM-dd'T'HH:mm";

export function formatInstant(instant: string | Date, zone: string): string {
  const dt = typeof instant === 'string' ? DateTime.fromISO(instant, { zone }) : DateTime.fromJSDate(instant, { zone });
  return dt.isValid ? dt.toFormat(STAMP) : '—';
}

/** The short name of the zone's offset at that instant ("CST", "GMT+1"), to show beside a form field. */
export function zoneAbbreviation(zone: string, at: Date = new Date()): string {
  return DateTime.fromJSDate(at, { zone }).toFormat('ZZZZ');
}

/** A value for <input type="datetime-local"> showing `instant` on the nursery's clock. */
export function toZonedInputValue(instant: Date, zone: string): string {
  return DateTime.fromJSDate(instant, { zone }).toFormat(INPUT);
}

/**
 * Reads a datetime-local value as wall-clock time in the nursery's zone and answers ISO 8601 with that offset.
 * An unreadable value comes back unchanged, so schema validation reports it instead of it silently vanishing.
 */
export function fromZonedInputValue(value: string, zone: string): string {
  const dt = DateTime.fromISO(value, { zone });
  return dt.isValid ? dt.toISO({ suppressMilliseconds: true }) ?? value : value;
}

/** The browser's own zone, the sensible default for a new nursery. */
export function browserTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

export function knownTimeZones(): string[] {
  return Intl.supportedValuesOf('timeZone');
}
