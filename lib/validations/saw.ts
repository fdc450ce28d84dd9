import { z } from 'zod';
import { dbIdSchema } from './db-id';

/** Reasons a board can be bad at the saw; words the operator sees on the buttons. */
export const DEFECT_REASONS = ['split', 'shake', 'wane', 'rot', 'twist', 'short', 'other'] as const;
export type DefectReason = (typeof DEFECT_REASONS)[number];

export const confirmBoardBodySchema = z
  .object({
    /** Where the kept remainder goes; defaults to the rack's intake spot. */
    location: z.string().trim().min(1).max(60).optional(),
    /** The operator confirms a new stock board is in their hands though the stock count shows none. */
    boardThere: z.literal(true).optional(),
  })
  .strict();
export type ConfirmBoardBody = z.infer<typeof confirmBoardBodySchema>;
export type ConfirmBoardBodyInput = z.input<typeof confirmBoardBodySchema>;

export const reportDefectBodySchema = z
  .object({
    reason: z.enum(DEFECT_REASONS, {
      error: 'Choose a reason: split, shake, wane, rot, twist, short or other.',
    }),
    note: z.string().trim().max(200).optional(),
    /** How much of the board is still sound, in whole millimetres (kept as an offcut when long enough). */
    usableMm: z.number().int('Whole millimetres only.').min(0, 'Cannot be negative.').max(20_000).optional(),
  })
  .strict();
export type ReportDefectBody = z.infer<typeof reportDefectBodySchema>;
export type ReportDefectBodyInput = z.input<typeof reportDefectBodySchema>;

export const findOffcutQuerySchema = z.object({
  tag: z
    .string()
    .trim()
    .min(1, 'Type or scan a tag.')
    .max(40)
    .transform((t) => t.toUpperCase()),
});

export const offcutIdsQuerySchema = z
  .string()
  .regex(/^\d+(,\d+)*$/, 'Give offcut ids as a comma-separated list, e.g. 1,2,3.')
  .transform((s) => [...new Set(s.split(',').map(Number))])
  .pipe(z.array(dbIdSchema()).max(200, 'At most 200 labels at a time.'));
