import { z } from 'zod';

const pence = z.number().int('Whole pence.').nonnegative().max(100_000_000);

/** Validates a pricing request before priceCuttingPlan, which throws on bad numbers. */
export const priceCuttingPlanInputSchema = z.object({
  sections: z.array(
    z.object({
      sectionName: z.string().trim().min(1).max(100),
      boards: z.array(
        z.object({
          source: z.enum(['stock', 'offcut']),
          length: z.number().int().positive().describe('whole millimetres'),
          costPence: pence,
          cuts: z.number().int().nonnegative().max(10_000),
        }),
      ),
    }),
  ),
  perCutPence: pence,
  offcutPencePerMetre: pence.nullish(),
});
