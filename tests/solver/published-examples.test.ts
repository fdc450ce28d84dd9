import { describe, expect, it } from 'vitest';
import { solve } from '@/solver';
import type { SolveInput } from '@/solver/types';
import { PAPER_ROLL_WIDTH, paperRolls } from './paper-rolls';
import { checkPlan } from './plan-checker';

const job = (stock: number, widths: [number, number][], kerf = 0): SolveInput => ({
  kerf,
  trim: 0,
  minOffcut: 0,
  timeLimitMs: 20_000,
  stock: [{ id: 'roll', length: stock, cost: 1, available: null }],
  offcuts: [],
  pieces: widths.map(([length, quantity]) => ({ id: `w${length}`, length, quantity })),
});

describe('published cutting-stock examples', () => {
  it('paper rolls (Wikipedia, "Cutting stock problem"): 73 rolls, waste 0.401 %, LP bound 72.917', () => {
    const input = job(PAPER_ROLL_WIDTH, paperRolls);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.totals.boards).toBe(73);
    expect(plan.lowerBound.boards).toBe(73); // ceil(72.917)
    expect(plan.provenOptimal).toBe(true);
    const wastePercent =
      (100 * (plan.totals.materialLength - plan.totals.pieceLength)) / plan.totals.materialLength;
    expect(wastePercent).toBeCloseTo(0.401, 3);
  });

  it.each([3, 5, 10])(
    'paper rolls with kerf %i mm: 74 rolls (each width + kerf, stock + kerf; computed with an independent integer solver, not published)',
    (kerf) => {
      const input = job(PAPER_ROLL_WIDTH, paperRolls, kerf);
      const plan = solve(input);
      expect(checkPlan(input, plan)).toEqual([]);
      expect(plan.totals.boards).toBe(74);
    },
  );

  it('Chvátal, Linear Programming (1983), ch. 13: rolls of 100, optimum 453, LP 452.25 (optimum from memory of the book)', () => {
    const input = job(100, [
      [14, 211],
      [31, 395],
      [36, 610],
      [45, 97],
    ]);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.totals.boards).toBe(453);
    expect(plan.lowerBound.boards).toBe(453); // ceil(452.25)
  });
});
