// Instances shaped like the public benchmark classes, with the optimum known by construction
// (perfect-fit instances, see perfect-fit.ts): each must reach it with a plan the independent checker
// accepts. The published sets themselves (BPPLIB) are run by `npm run bench`, which also measures speed.
import { describe, expect, it } from 'vitest';
import { solve } from '@/solver';
import { checkPlan } from './plan-checker';
import { randomCuts, toSolveInput, triplets } from './perfect-fit';

const chosen = [triplets(1, 20), triplets(2, 20), triplets(3, 40), randomCuts(4, 30), randomCuts(5, 50)];

describe('benchmark-shaped instances reach the optimum known by construction', () => {
  it('the construction holds: the pieces fill exactly optimum × capacity', () => {
    for (const inst of chosen) {
      expect(inst.pieces.reduce((a, b) => a + b, 0)).toBe(inst.optimum * inst.capacity);
    }
  });

  it.each(chosen.map((c) => [c.name, c] as const))('%s', (_name, inst) => {
    const input = toSolveInput(inst, 20_000);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.lowerBound.boards).toBeLessThanOrEqual(inst.optimum);
    expect(plan.totals.boards).toBe(inst.optimum);
  });
});
