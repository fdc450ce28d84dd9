import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareSolver, solve } from '@/solver';
import { arcFlowCost, bruteForceCost } from './exact-reference';
import { yardJob } from './job-arbitrary';
import { checkPlan } from './plan-checker';

const pence = (x: number) => Math.round(x * 100);

beforeAll(async () => {
  await prepareSolver();
});

describe('solver cost equals an independent exact reference', () => {
  it('tiny jobs (≤ 6 pieces, nominal and full-length pieces too): brute force', () => {
    fc.assert(
      fc.property(
        yardJob(2, true).filter((j) => j.pieces.reduce((s, p) => s + p.quantity, 0) <= 6),
        (job) => {
          const plan = solve(job);
          expect(checkPlan(job, plan)).toEqual([]);
          const best = bruteForceCost(job);
          expect(best).not.toBeNull();
          expect(plan.unplaced).toEqual([]);
          expect(pence(plan.totals.cost)).toBe(best);
          if (plan.provenOptimal) expect(pence(plan.lowerBound.cost)).toBe(best);
        },
      ),
      { numRuns: 40, seed: 20261202 },
    );
  });

  it('small jobs (up to 36 exact pieces): arc-flow integer model', async () => {
    await fc.assert(
      fc.asyncProperty(yardJob(12, false), async (job) => {
        const plan = solve(job);
        expect(checkPlan(job, plan)).toEqual([]);
        const best = await arcFlowCost(job, 30);
        expect(best).not.toBeNull();
        expect(pence(plan.totals.cost)).toBe(best);
        expect(pence(plan.lowerBound.cost)).toBeLessThanOrEqual(best!);
        // With time to spare the solver proves it: its bound reaches the plan's cost.
        expect(plan.provenOptimal).toBe(true);
        expect(pence(plan.lowerBound.cost)).toBe(best);
      }),
      { numRuns: 20, seed: 20261202 },
    );
  });

  it('small nominal jobs (up to 7 pieces, untrimmed and full-length boards): brute force, proven', () => {
    fc.assert(
      fc.property(
        yardJob(3, true).filter((j) => j.pieces.reduce((s, p) => s + p.quantity, 0) <= 7),
        (job) => {
          const plan = solve(job);
          expect(checkPlan(job, plan)).toEqual([]);
          const best = bruteForceCost(job);
          expect(pence(plan.totals.cost)).toBe(best);
          expect(plan.provenOptimal).toBe(true);
          // The label names where the bound came from; an integer-model bound is the proven cost.
          if (plan.lowerBound.method === 'integer') expect(pence(plan.lowerBound.cost)).toBe(best);
        },
      ),
      { numRuns: 30, seed: 20261203 },
    );
  });
});
