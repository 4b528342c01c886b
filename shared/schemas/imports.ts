import { z } from 'zod';

/** Settings a person can give for a file; anything left out is detected. Shared by the upload form, the API and the CLI. */
export const importSettings = z.object({
  logger: z.string().trim().min(1).max(80).optional(),
  tz: z.string().trim().min(1).max(64).optional(),
  unit: z.enum(['C', 'F']).optional(),
  dateOrder: z.enum(['dmy', 'mdy', 'ymd']).optional(),
  dryRun: z.union([z.boolean(), z.enum(['true', 'false', '1', '0'])]).optional().transform((v) => v === true || v === 'true' || v === '1'),
});
export type ImportSettings = z.output<typeof importSettings>;

export const importListQuery = z.object({
  loggerId: z.coerce.number().int().positive().optional(),
  status: z.enum(['running', 'completed', 'failed']).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
