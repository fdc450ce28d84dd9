import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareSolver, solve } from '@/solver';
import type { SolveInput } from '@/solver/types';
import { arcFlowCost, bruteForceCost } from './exact-reference';
import { checkPlan } from './plan-checker';

// Generated yard jobs (invented, our own generator): a few stock lengths priced a little higher per
// metre for longer lengths, some capped, free offcuts, kerf 3–5, trim 0–15. The solver's cost must
// equal an exact reference written independently in exact-reference.ts.
const yardJob = (maxPieces: number, nominal: boolean): fc.Arbitrary<SolveInput> =>
  fc
    .record({
      kerf: fc.integer({ min: 3, max: 5 }),
      trim: fc.integer({ min: 0, max: 15 }),
      perMetre: fc.integer({ min: 180, max: 650 }),
      lengths: fc.uniqueArray(fc.constantFrom(1800, 2400, 3000, 3600, 4200, 4800, 6000), {
        minLength: 2,
        maxLength: 4,
      }),
      caps: fc.array(fc.option(fc.integer({ min: 0, max: 3 }), { nil: null }), {
        minLength: 4,
        maxLength: 4,
      }),
      offcuts: fc.array(fc.integer({ min: 300, max: 3000 }), { maxLength: 4 }),
      lines: fc.array(
        fc.record({
          length: fc.oneof(fc.integer({ min: 250, max: 3000 }), fc.constantFrom(1800, 2400, 3600)),
          quantity: fc.integer({ min: 1, max: maxPieces }),
          tolerance: nominal ? fc.constantFrom(0, 0, 3, 5) : fc.constant(0),
        }),
        { minLength: 1, maxLength: 3 },
      ),
    })
    .map((j) => {
      const lengths = [...j.lengths].sort((a, b) => a - b);
      return {
        kerf: j.kerf,
        trim: j.trim,
        minOffcut: 300,
        timeLimitMs: 20_000,
        stock: lengths.map((length, k) => ({
          id: `S${length}`,
          length,
          cost: Math.round(j.perMetre * (length / 1000) * (1 + 0.015 * (length / 1000 - 1.8))) / 100,
          // the longest length stays uncapped so every piece can be placed
          available: k === lengths.length - 1 ? null : j.caps[k],
        })),
        offcuts: j.offcuts.map((length, k) => ({ id: `K-${k}`, length })),
        pieces: j.lines.map((l, k) => ({ id: `P${k}`, ...l })),
      };
    })
    // every piece fits the longest (uncapped) length, so the optimum places them all
    .filter((j) => j.pieces.every((p) => p.length <= j.stock[j.stock.length - 1].length - j.trim - j.kerf));

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
