import { z } from 'zod';

export const idParam = z.object({ id: z.coerce.number().int().positive() });

/** A user-facing instant: ISO 8601 with an offset or Z, normalised to a Date. */
export const isoInstant = z.iso.datetime({ offset: true }).transform((s) => new Date(s));

export const ROLES = ['owner', 'staff', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

/** Ranks let the server say "at least staff" without listing roles. */
export const ROLE_RANK: Record<Role, number> = { viewer: 1, staff: 2, owner: 3 };

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

/** Accepts an IANA zone name; validity is checked with the runtime's own time-zone database. */
export const ianaZone = z.string().min(1).max(64).refine((zone) => {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}, 'Not a known IANA time zone, e.g. Europe/Berlin or America/Chicago');
