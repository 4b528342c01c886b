import { z } from 'zod';
import { isoInstant } from './common';

export const loggerBody = z.object({
  label: z.string().trim().min(1, 'Give the logger a label').max(60),
  serial: z.string().trim().max(80).default(''),
  notes: z.string().max(2000).default(''),
  /** Where the logger is placed now; omitted means "not placed yet". */
  roomId: z.number().int().positive().nullable().optional(),
});
export const loggerPatch = loggerBody.omit({ roomId: true }).partial();
/** Moving closes the current placement at `at` and opens the next one in `roomId` (null = taken out of every room). */
export const loggerMoveBody = z.object({
  roomId: z.number().int().positive().nullable(),
  at: isoInstant.optional(),
});
export type LoggerInput = z.input<typeof loggerBody>;
