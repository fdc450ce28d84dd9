import { z } from 'zod';

const money = z.number().finite().nonnegative().max(1_000_000);

/** Validates a pricing request before priceCuttingPlan, which throws on bad numbers. */
export const priceCuttingPlanInputSchema = z.object({
  sections: z.array(
    z.object({
      sectionName: z.string().trim().min(1).max(100),
      boards: z.array(
        z.object({
          source: z.enum(['stock', 'offcut']),
          length: z.number().int().positive().describe('whole millimetres'),
          cost: money,
          cuts: z.number().int().nonnegative().max(10_000),
        }),
      ),
    }),
  ),
  perCutCharge: money,
  offcutPricePerMetre: money.nullish(),
});
