import { z } from 'zod';

/** POST /api/plans/[planId]/email: the address defaults to the job's customer e-mail. */
export const emailCutSheetBodySchema = z
  .object({
    to: z
      .union([z.literal(''), z.string().trim().toLowerCase().email('Enter a valid e-mail address.')])
      .optional(),
    message: z.string().max(2000).optional(),
  })
  .strict();
export type EmailCutSheetBodyInput = z.input<typeof emailCutSheetBodySchema>;
