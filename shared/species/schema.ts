// Validation of a species profile: the built-in ones and the copies owners edit (the server checks edits with it).
import { z } from 'zod';
import { describeCallusCurveProblem } from '../exposure/callusRate';

const temperatureC = z.number();

/** Every number in a profile, by its path; each needs a citation or a stated design reason. */
export const SOURCED_FIELDS = [
  'freezeC',
  'band.minC',
  'band.maxC',
  'storageMaxC',
  'callus.baseC',
  'callus.optLowC',
  'callus.optHighC',
  'callus.upperC',
  'callus.hoursAtOptimum',
] as const;

export type SourcedField = (typeof SOURCED_FIELDS)[number];

const citation = z.string().trim().min(1, 'each number needs a source or a reason');

const sourcesSchema = z.object(
  Object.fromEntries(SOURCED_FIELDS.map((field) => [field, citation])) as Record<SourcedField, typeof citation>,
);

export const speciesProfileSchema = z
  .object({
    key: z.string().regex(/^[a-z][a-z0-9-]*$/, 'key: lower-case letters, digits and dashes, starting with a letter'),
    name: z.string().trim().min(1),
    /** Alarm limit: freeze exposure counts the time strictly below it. */
    freezeC: temperatureC,
    /** Where the batch should stay during storage (or callusing, for warm-callused species). */
    band: z.object({ minC: temperatureC, maxC: temperatureC }),
    /** Above this, cold storage is too warm (buds push); null for species kept warm to callus. */
    storageMaxC: temperatureC.nullable(),
    callus: z.object({
      baseC: temperatureC,
      optLowC: temperatureC,
      optHighC: temperatureC,
      upperC: temperatureC,
      hoursAtOptimum: z.number().positive(),
    }),
    sources: sourcesSchema,
  })
  .superRefine((profile, ctx) => {
    const { band, freezeC, storageMaxC, callus } = profile;
    if (!(band.minC < band.maxC)) {
      ctx.addIssue({ code: 'custom', path: ['band'], message: `band minimum ${band.minC} °C must be below its maximum ${band.maxC} °C` });
    }
    if (freezeC > band.minC) {
      ctx.addIssue({ code: 'custom', path: ['freezeC'], message: `freeze limit ${freezeC} °C lies inside the band (minimum ${band.minC} °C)` });
    }
    if (storageMaxC !== null && storageMaxC < band.maxC) {
      ctx.addIssue({
        code: 'custom',
        path: ['storageMaxC'],
        message: `storage maximum ${storageMaxC} °C is below the band maximum ${band.maxC} °C`,
      });
    }
    const curveProblem = describeCallusCurveProblem(callus);
    if (curveProblem) ctx.addIssue({ code: 'custom', path: ['callus'], message: curveProblem });
  });

export type SpeciesProfile = z.infer<typeof speciesProfileSchema>;
