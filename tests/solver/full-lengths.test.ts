import { describe, expect, it } from 'vitest';
import { solve, solveInputSchema } from '@/solver';
import { buildModel } from '@/solver/model';
import { checkPlan } from './plan-checker';

// Check values from DESIGN.md, "Solver contract", full lengths and nominal pieces (kerf 3, trim 5;
// stock 3.6/4.8/6.0 m). Yards sell a piece that takes a whole stock length as that length, uncut,
// and accept factory ends on nominal pieces: common practice, no published source.
const job = (pieces: { id: string; length: number; quantity: number; tolerance?: number }[]) =>
  solveInputSchema.parse({
    kerf: 3,
    trim: 5,
    minOffcut: 300,
    timeLimitMs: 20_000,
    stock: [
      { id: 'S3600', length: 3600, cost: 7.2 },
      { id: 'S4800', length: 4800, cost: 9.6 },
      { id: 'S6000', length: 6000, cost: 12 },
    ],
    pieces,
  });

describe('full lengths and nominal pieces (DESIGN.md check values)', () => {
  it('2 × 3600 exact → two 3.6 m boards, uncut', () => {
    const input = job([{ id: 'post', length: 3600, quantity: 2 }]);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.boards.map((b) => b.sourceId)).toEqual(['S3600', 'S3600']);
    for (const b of plan.boards) {
      expect(b.fullLength).toBe(true);
      expect(b.trim).toBe(0);
      expect(b.marks).toEqual([]);
      expect(b.kerfLoss).toBe(0);
      expect(b.cutLengths).toEqual([3600]);
    }
    expect(plan.provenOptimal).toBe(true);
  });

  it('1 × 6000 exact → one 6.0 m board, uncut', () => {
    const input = job([{ id: 'beam', length: 6000, quantity: 1 }]);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.unplaced).toEqual([]);
    expect(plan.boards).toHaveLength(1);
    expect(plan.boards[0]).toMatchObject({ sourceId: 'S6000', fullLength: true, trim: 0, marks: [] });
  });

  it('4 × 2400 with tolerance 5 → two 4.8 m boards, each cut once, pieces 2398–2399 mm, no trim', () => {
    const input = job([{ id: 'clad', length: 2400, quantity: 4, tolerance: 5 }]);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.boards.map((b) => b.sourceId)).toEqual(['S4800', 'S4800']);
    for (const b of plan.boards) {
      expect(b.trim).toBe(0);
      expect(b.marks).toHaveLength(1);
      expect([...b.cutLengths].sort()).toEqual([2398, 2399]);
      expect(b.fullLength).toBe(false);
    }
    expect(plan.provenOptimal).toBe(true);
  });

  it('2 × 2400 exact → not from one 4.8 m board (4803 > 4792)', () => {
    const input = job([{ id: 'rail', length: 2400, quantity: 2 }]);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.boards.some((b) => b.sourceId === 'S4800' && b.pieces.length === 2)).toBe(false);
    // 2 × 2400 + 3 + 5 + 3 = 4811 ≤ 6000: one 6.0 m board (£12) beats two 3.6 m boards (£14.40).
    expect(plan.boards.map((b) => b.sourceId)).toEqual(['S6000']);
    expect(plan.boards[0].trim).toBe(5);
  });

  it('a nominal piece is not cut short when its ordered length fits', () => {
    const input = job([{ id: 'stud', length: 2400, quantity: 1, tolerance: 5 }]);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.boards[0].cutLengths).toEqual([2400]);
  });

  // DESIGN.md: only a piece with length − tolerance ≤ board ≤ length is sold at a stock length. A piece
  // longer than a stock length never fits it, so it must not loosen the bounds to untrimmed boards.
  it('only a piece that can take a whole stock length lets the bounds drop the trim', () => {
    expect(buildModel(job([{ id: 'rail', length: 4000, quantity: 2 }])).relaxed).toBe(false);
    expect(buildModel(job([{ id: 'post', length: 3600, quantity: 2 }])).relaxed).toBe(true);
    expect(buildModel(job([{ id: 'clad', length: 2400, quantity: 4, tolerance: 5 }])).relaxed).toBe(true);
  });
});
