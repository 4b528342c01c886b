// Request shapes for planting-out records, take assessments and season reports, shared by forms and routes.
import { z } from 'zod';
import { calendarDay } from '../schemas/batches';
import { TEMPERATURE_UNITS } from '../schemas/common';

const graftCount = (what: string) => z.coerce.number(`Enter how many grafts ${what}`).int('Whole grafts only');
const notes = z.string().trim().max(1000);

// Fields without defaults, so a patch leaves out what it does not name instead of blanking it.
const plantingFields = {
  plantedOn: calendarDay,
  count: graftCount('were planted').min(1, 'At least one graft'),
  location: z.string().trim().min(1, 'Name the bed or field').max(120),
  notes,
};
export const plantingBody = z.object({ ...plantingFields, notes: notes.default('') });
export type PlantingInput = z.input<typeof plantingBody>;

/** The day is not editable: it decides the frozen storage figures, so a wrong day is deleted and entered again. */
export const plantingPatch = z.object({ count: plantingFields.count, location: plantingFields.location, notes }).partial();

const assessmentFields = {
  assessedOn: calendarDay,
  grown: graftCount('are growing').min(0, 'Zero or more grafts'),
  notes,
};
export const assessmentBody = z.object({ ...assessmentFields, notes: notes.default('') });
export type AssessmentInput = z.input<typeof assessmentBody>;
export const assessmentPatch = z.object(assessmentFields).partial();

export const seasonParam = z.object({ season: z.coerce.number().int().min(2000).max(2200) });
export const reportQuery = z.object({ unit: z.enum(TEMPERATURE_UNITS).default('C') });
