import { z } from 'zod';
import { dbIdSchema } from './db-id';

const mm = (max: number) => z.number().int('Whole millimetres only.').min(0, 'Cannot be negative.').max(max);

/** Optional overrides of the yard settings for one planning run. */
export const createPlanBodySchema = z
  .object({
    kerfMm: mm(20),
    trimMm: mm(200),
    minOffcutMm: mm(6000),
    useOffcuts: z.boolean(),
    stockLengthIds: z.array(dbIdSchema()).min(1, 'Allow at least one stock length.').nullable(),
    timeLimitMs: z.number().int().min(200).max(20_000),
  })
  .partial()
  .strict();
export type CreatePlanBody = z.infer<typeof createPlanBodySchema>;
export type CreatePlanBodyInput = z.input<typeof createPlanBodySchema>;
