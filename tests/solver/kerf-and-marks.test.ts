import { describe, expect, it } from 'vitest';
import { solve, solveInputSchema } from '@/solver';
import { checkPlan } from './plan-checker';

// Kerf arithmetic: n pieces cut from one end of a board take n kerfs, or n − 1 when the last piece
// ends exactly at the board's end — common practice (the same arithmetic appears in the WOODWEB
// knowledge base's sawing notes). The figures below are worked by hand from that rule.
describe('kerf, trim and marks', () => {
  it('two pieces on a trimmed board: marks, kerf loss, kept remainder', () => {
    const input = solveInputSchema.parse({
      kerf: 3,
      trim: 10,
      minOffcut: 300,
      stock: [{ id: 'S2400', length: 2400 }],
      pieces: [{ id: 'rail', length: 1000, quantity: 2 }],
    });
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.boards).toHaveLength(1);
    const b = plan.boards[0];
    // usable = 2400 − 10 − 3 = 2387; cuts after each piece: 1000 and 1000 + 3 + 1000
    expect(b.marks).toEqual([1000, 2003]);
    expect(b.remainder).toBe(2387 - 2000 - 2 * 3);
    expect(b.keepRemainder).toBe(true);
    expect(b.kerfLoss).toBe(3 * 3); // trim cut + two piece cuts
    expect(b.scrap).toBe(10);
  });

  it('last piece ending exactly at the board end needs no last cut', () => {
    const input = solveInputSchema.parse({
      kerf: 3,
      trim: 10,
      minOffcut: 300,
      stock: [{ id: 'S2400', length: 2400 }],
      pieces: [{ id: 'p', length: 1192, quantity: 2 }],
    });
    const plan = solve(input);
    expect(plan.boards).toHaveLength(1); // 1192 + 3 + 1192 = 2387 = usable
    expect(plan.boards[0].marks).toEqual([1192]);
    expect(plan.boards[0].remainder).toBe(0);
  });

  it('offcuts are not trimmed and are used before new stock', () => {
    const input = solveInputSchema.parse({
      kerf: 3,
      trim: 10,
      minOffcut: 300,
      stock: [{ id: 'S2400', length: 2400, cost: 5 }],
      offcuts: [{ id: 'K-1', length: 1000 }],
      pieces: [{ id: 'p', length: 1000, quantity: 1 }],
    });
    const plan = solve(input);
    expect(plan.boards.map((b) => b.sourceId)).toEqual(['K-1']);
    expect(plan.boards[0].trim).toBe(0);
    expect(plan.totals.cost).toBe(0);
  });

  it('reports pieces longer than every source and pieces beyond the stock cap', () => {
    const input = solveInputSchema.parse({
      kerf: 3,
      trim: 0,
      stock: [{ id: 'S3000', length: 3000, available: 1 }],
      pieces: [
        { id: 'long', length: 3500, quantity: 1 },
        { id: 'p', length: 2000, quantity: 2 },
      ],
    });
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.unplaced.map((u) => `${u.id}:${u.reason}`).sort()).toEqual([
      'long:longer-than-every-source',
      'p:not-enough-stock',
    ]);
  });

  it('picks the cheaper stock length when it holds the same pieces', () => {
    const input = solveInputSchema.parse({
      kerf: 3,
      trim: 0,
      stock: [
        { id: 'S4800', length: 4800, cost: 10 },
        { id: 'S3600', length: 3600, cost: 7 },
      ],
      pieces: [{ id: 'p', length: 1700, quantity: 2 }],
    });
    const plan = solve(input);
    expect(plan.boards.map((b) => b.sourceId)).toEqual(['S3600']);
    expect(plan.provenOptimal).toBe(true);
  });
});
