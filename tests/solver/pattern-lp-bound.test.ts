// The pattern LP against values that are facts: on a perfect-fit instance (perfect-fit.ts) the LP
// relaxation equals the number of boards by construction, and on Wikipedia's paper-roll example
// ("Cutting stock problem", rolls of 5600) the published LP value is 72.917. Column generation
// must converge to those values, also when it stops early on Farley's bound.
import { describe, expect, it } from 'vitest';
import { solvePatternLp } from '@/solver/column-generation';
import { buildModel } from '@/solver/model';
import type { SolveInput } from '@/solver/types';
import { randomCuts, toSolveInput, triplets } from './perfect-fit';
import { PAPER_ROLL_WIDTH, paperRolls } from './paper-rolls';

function lpOf(input: SolveInput, stopAtCost?: number) {
  const model = buildModel(input);
  const items = model.items.map((it) => ({ weight: it.weight, demand: it.count }));
  const bins = model.bins.map((b) => ({ capacity: b.capacity, cost: b.cost, limit: b.limit }));
  return solvePatternLp(items, bins, { maxPivots: 100_000, stopAtCost });
}

const instances = [triplets(7, 20), triplets(8, 40), randomCuts(9, 40)];

describe('pattern LP on perfect-fit instances equals the optimum by construction', () => {
  it.each(instances.map((c) => [c.name, c] as const))('%s', (_name, inst) => {
    const input = toSolveInput(inst, 20_000);
    const full = lpOf(input);
    expect(full.converged).toBe(true);
    expect(full.value).toBeCloseTo(inst.optimum, 6);

    // Told the optimum's cost, it may stop as soon as Farley's bound proves it: still a valid bound.
    const early = lpOf(input, inst.optimum);
    expect(early.converged).toBe(true);
    expect(early.pivots).toBeLessThanOrEqual(full.pivots);
    expect(Math.ceil(early.value - 1e-6)).toBe(inst.optimum);
  });
});

describe('pattern LP on a published example', () => {
  it("paper rolls (Wikipedia, 'Cutting stock problem'): LP value 72.917", () => {
    const widths = paperRolls;
    const input: SolveInput = {
      kerf: 0,
      trim: 0,
      minOffcut: 0,
      timeLimitMs: 20_000,
      stock: [{ id: 'roll', length: PAPER_ROLL_WIDTH, cost: 1, available: null }],
      offcuts: [],
      pieces: widths.map(([length, quantity]) => ({ id: `w${length}`, length, quantity })),
    };
    const full = lpOf(input);
    expect(full.converged).toBe(true);
    expect(Math.abs(full.value - 72.917)).toBeLessThan(0.0005);
  });
});
