import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solve, solveInputSchema } from '@/solver';
import { checkPlan } from './plan-checker';
import { jobArbitrary } from './job-arbitrary';

describe('solve: properties checked by an independent plan checker', () => {
  it('gives valid plans for varied jobs (placement, fit, caps, offcuts once, bounds, marks)', () => {
    fc.assert(
      fc.property(jobArbitrary, (job) => {
        const plan = solve(job);
        expect(checkPlan(job, plan)).toEqual([]);
      }),
      { numRuns: 150, seed: 20240601 },
    );
  });

  it('gives the same plan for the same job', () => {
    fc.assert(
      fc.property(jobArbitrary, (job) => {
        const strip = (p: ReturnType<typeof solve>) => JSON.stringify({ ...p, timeMs: 0 });
        expect(strip(solve(job))).toEqual(strip(solve(structuredClone(job))));
      }),
      { numRuns: 40, seed: 7 },
    );
  });

  it('places every piece when stock is unlimited', () => {
    fc.assert(
      fc.property(jobArbitrary, (job) => {
        const open = { ...job, stock: [...job.stock, { id: 'UNLIMITED', length: 7000, available: null }] };
        const plan = solve(open);
        expect(plan.unplaced.filter((u) => u.reason === 'not-enough-stock')).toEqual([]);
        expect(checkPlan(open, plan)).toEqual([]);
      }),
      { numRuns: 60, seed: 99 },
    );
  });

  it('the checker catches an over-full board and a lost piece', () => {
    const job = solveInputSchema.parse({
      kerf: 3,
      trim: 0,
      stock: [{ id: 'S', length: 1000 }],
      pieces: [{ id: 'a', length: 500, quantity: 2 }],
    });
    const plan = solve(job);
    expect(checkPlan(job, plan)).toEqual([]);
    const merged = structuredClone(plan);
    merged.boards = [
      { ...merged.boards[0], pieces: ['a', 'a'], pieceLengths: [500, 500], cutLengths: [500, 500] },
    ];
    expect(checkPlan(job, merged).some((e) => e.includes('over-full'))).toBe(true);
    const lost = structuredClone(plan);
    lost.boards = lost.boards.slice(1);
    expect(checkPlan(job, lost).some((e) => e.includes('accounted'))).toBe(true);
  });
});
