import { z } from 'zod';
import { SOURCED_FIELDS, type SourcedField } from '../species/schema';

/** A species profile key, built-in or the nursery's own copy (the same pattern the profile schema uses). */
export const profileKey = z.string().trim().regex(/^[a-z][a-z0-9-]*$/, 'Lower-case letters, digits and dashes, starting with a letter').max(40);

const profileName = z.string().trim().min(1, 'Give the profile a name').max(120);

/** Copy a built-in profile (or one of the nursery's) under a new key and name; the copy can then be edited. */
export const profileCopyBody = z.object({
  from: profileKey,
  key: profileKey,
  name: profileName,
});
export type ProfileCopyInput = z.input<typeof profileCopyBody>;

const celsius = z.number('Enter a temperature in °C').finite();
const citation = z.string().trim().min(1).max(1000);

/**
 * Changes to a nursery profile; what is left out stays. The merged profile must pass the shared
 * speciesProfileSchema. A changed number without a new source is marked as the nursery's own value.
 */
export const profilePatch = z
  .object({
    name: profileName,
    freezeC: celsius,
    band: z.object({ minC: celsius, maxC: celsius }).partial(),
    storageMaxC: celsius.nullable(),
    callus: z
      .object({ baseC: celsius, optLowC: celsius, optHighC: celsius, upperC: celsius, hoursAtOptimum: z.number().positive('Must be above 0 hours') })
      .partial(),
    sources: z.object(Object.fromEntries(SOURCED_FIELDS.map((f) => [f, citation])) as Record<SourcedField, typeof citation>).partial(),
  })
  .partial();
export type ProfilePatch = z.output<typeof profilePatch>;
