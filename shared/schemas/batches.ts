import { z } from 'zod';
import { isoInstant } from './common';
import { profileKey } from './profiles';

export const BATCH_STATUSES = ['in_storage', 'planted_out', 'discarded'] as const;
export type BatchStatus = (typeof BATCH_STATUSES)[number];

/** Suggestions only: the method and medium fields take any text, these fill the form's pick list. */
export const GRAFT_METHOD_SUGGESTIONS = ['whip-and-tongue', 'cleft', 'side-veneer', 'chip bud', 'omega', 'saddle', 'splice', 'bark'] as const;
export const STORAGE_MEDIUM_SUGGESTIONS = ['moist sawdust', 'wood shavings', 'peat', 'sand', 'plastic bag', 'coir', 'bare'] as const;

const text = (max: number, required: string) => z.string().trim().min(1, required).max(max);
const optionalText = (max: number) => z.string().trim().max(max);

/** Letters, digits and . _ / - (e.g. 26-APL-014); empty asks the server to number the batch. */
export const batchCode = z
  .string()
  .trim()
  .max(40)
  .regex(/^([A-Za-z0-9][A-Za-z0-9._/-]*)?$/, 'Letters, digits and . _ / - only, e.g. 26-APL-014');

/** A calendar day, YYYY-MM-DD (the grafting day, on the nursery's calendar). */
export const calendarDay = z.iso.date('Enter a date as YYYY-MM-DD');

/** The species profile a batch is measured against; the emptiness check comes first so a form says "choose". */
const speciesChoice = z.string().trim().min(1, 'Choose a species').pipe(profileKey);

const graftCount = z.coerce.number('Enter how many grafts').int('Whole grafts only').min(1, 'At least one graft').max(100_000);

/** What describes the grafts themselves, as opposed to where they are; no defaults, so a patch leaves out what it does not name. */
const describing = {
  species: speciesChoice,
  scionCultivar: text(120, 'Name the scion cultivar'),
  rootstock: text(120, 'Name the rootstock'),
  method: text(60, 'Name the grafting method'),
  count: graftCount,
  graftedOn: calendarDay,
  grafter: optionalText(120),
  storageMedium: optionalText(80),
  notes: z.string().max(2000),
};

const batchFields = z.object({
  ...describing,
  code: batchCode.default(''),
  grafter: describing.grafter.default(''),
  storageMedium: describing.storageMedium.default(''),
  notes: describing.notes.default(''),
});

/** One batch, placed in a room when made; `placedAt` empty means now. */
export const batchBody = batchFields.extend({
  roomId: z.number('Choose a room').int().positive(),
  placedAt: isoInstant.optional(),
});
export type BatchInput = z.input<typeof batchBody>;

/** Corrections to a batch's description; where it is changes only by moves, with a time. */
export const batchPatch = z.object({ ...describing, code: batchCode.min(1, 'A batch keeps a code') }).partial();

/** One row of a grafting day: what differs between batches made that day. Blank method/medium take the day's. */
export const bulkBatchRow = z.object({
  code: batchCode.default(''),
  species: speciesChoice,
  scionCultivar: text(120, 'Name the scion cultivar'),
  rootstock: text(120, 'Name the rootstock'),
  method: z.string().trim().max(60).default(''),
  count: graftCount,
  storageMedium: z.string().trim().max(80).default(''),
  notes: z.string().max(2000).default(''),
});

/** A grafting day: the day, who grafted, the room and the usual method and medium, then one row per batch. */
export const bulkBatchBody = z
  .object({
    graftedOn: calendarDay,
    grafter: optionalText(120).default(''),
    roomId: z.number('Choose a room').int().positive(),
    placedAt: isoInstant.optional(),
    method: z.string().trim().max(60).default(''),
    storageMedium: optionalText(80).default(''),
    rows: z.array(bulkBatchRow).min(1, 'Add at least one batch').max(200, 'At most 200 batches per grafting day'),
  })
  .superRefine((day, ctx) => {
    day.rows.forEach((row, i) => {
      if (!row.method && !day.method) {
        ctx.addIssue({ code: 'custom', path: ['rows', i, 'method'], message: 'Name the method here or for the whole day' });
      }
    });
  });
export type BulkBatchInput = z.input<typeof bulkBatchBody>;

/** Moving closes the open placement at `at` (empty: now) and opens the next in `roomId`. */
export const batchMoveBody = z.object({
  roomId: z.number('Choose a room').int().positive(),
  at: isoInstant.optional(),
});

/** Leaving storage (planted out or discarded) closes the open placement at `at` (empty: now). */
export const batchLeaveBody = z.object({
  at: isoInstant.optional(),
  note: z.string().trim().max(500).default(''),
});

export const BATCH_SORT_KEYS = ['code', 'graftedOn', 'species', 'scionCultivar', 'rootstock', 'count', 'status', 'room'] as const;
export type BatchSortKey = (typeof BATCH_SORT_KEYS)[number];

/** Filters of the batch list; all optional, combined with AND. */
export const batchListQuery = z.object({
  species: profileKey.optional(),
  status: z.enum(BATCH_STATUSES).optional(),
  roomId: z.coerce.number().int().positive().optional(),
  /** Matches scion cultivar or rootstock, anywhere in the text, ignoring case. */
  cultivar: z.string().trim().max(120).optional(),
  graftedFrom: calendarDay.optional(),
  graftedTo: calendarDay.optional(),
  sort: z.enum(BATCH_SORT_KEYS).default('graftedOn'),
  order: z.enum(['asc', 'desc']).default('desc'),
});
export type BatchListQuery = z.input<typeof batchListQuery>;
