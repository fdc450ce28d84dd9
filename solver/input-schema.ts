import { z } from 'zod';

// Lengths above 100 m are not timber; the cap also keeps the millimetre DP tables bounded.
const MAX_LENGTH_MM = 100_000;
const mm = z.number().int().min(1).max(MAX_LENGTH_MM);

export const stockInputSchema = z.object({
  id: z.string().min(1),
  length: mm,
  cost: z.number().min(0).finite().nullish(),
  available: z.number().int().min(0).nullish(),
});

export const offcutInputSchema = z.object({ id: z.string().min(1), length: mm });

export const pieceInputSchema = z
  .object({
    id: z.string().min(1),
    length: mm,
    quantity: z.number().int().min(1).max(100_000).default(1),
    /** Millimetres a nominal piece may be delivered short; 0 = exact. */
    tolerance: z.number().int().min(0).max(1000).default(0),
  })
  .refine((p) => p.tolerance < p.length, {
    message: 'tolerance must be shorter than the piece',
    path: ['tolerance'],
  });

export const solveInputSchema = z
  .object({
    kerf: z.number().int().min(0).max(50).default(0),
    trim: z.number().int().min(0).max(1000).default(0),
    minOffcut: z.number().int().min(0).max(MAX_LENGTH_MM).default(0),
    timeLimitMs: z.number().int().min(1).max(600_000).default(2000),
    stock: z.array(stockInputSchema).default([]),
    offcuts: z.array(offcutInputSchema).default([]),
    pieces: z.array(pieceInputSchema),
  })
  .superRefine((job, ctx) => {
    const seen = new Set<string>();
    for (const s of [...job.stock, ...job.offcuts]) {
      if (seen.has(s.id)) ctx.addIssue({ code: 'custom', message: `duplicate source id "${s.id}"` });
      seen.add(s.id);
    }
    const pieceIds = new Set<string>();
    for (const p of job.pieces) {
      if (pieceIds.has(p.id)) ctx.addIssue({ code: 'custom', message: `duplicate piece id "${p.id}"` });
      pieceIds.add(p.id);
    }
    const total = job.pieces.reduce((n, p) => n + p.quantity, 0);
    if (total > 100_000) ctx.addIssue({ code: 'custom', message: 'more than 100000 pieces in one job' });
  });

export type SolveInputRaw = z.input<typeof solveInputSchema>;
