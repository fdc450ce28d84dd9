import { describe, expect, it } from 'vitest';
import { longestFirstBaseline } from '@/lib/plans/longest-first-baseline';

describe('longest-first baseline', () => {
  // Worked by hand: pieces 2000, 2000, 1500, 1500, 1000 from 4800 boards, kerf 3, no trim.
  // Board 1: 2000 + 3 + 2000 + 3 = 4006, 794 left: 1500 does not fit. Board 2: 1500 + 3 + 1500 + 3 = 3006,
  // then 1000 + 3 → 4009 ≤ 4803. Two boards, scrap = 9600 − 8000 = 1600.
  it('packs longest first into the first board that fits', () => {
    const r = longestFirstBaseline({
      kerf: 3,
      trim: 0,
      minOffcut: 300,
      timeLimitMs: 100,
      stock: [{ id: 'S1', length: 4800, cost: 12 }],
      offcuts: [],
      pieces: [
        { id: 'a', length: 2000, quantity: 2 },
        { id: 'b', length: 1500, quantity: 2 },
        { id: 'c', length: 1000, quantity: 1 },
      ],
    });
    expect(r).toEqual({ boards: 2, cost: 24, scrap: 1600 });
  });

  it('takes trim and its kerf off new stock', () => {
    // usable = 2400 − 10 − 3 = 2387: a 2390 piece does not fit a 2400 board, so it goes on the 3000.
    const r = longestFirstBaseline({
      kerf: 3,
      trim: 10,
      minOffcut: 300,
      timeLimitMs: 100,
      stock: [
        { id: 'S3', length: 3000, cost: 9 },
        { id: 'S2', length: 2400, cost: 7 },
      ],
      offcuts: [],
      pieces: [{ id: 'a', length: 2390, quantity: 1 }],
    });
    expect(r.boards).toBe(1);
    expect(r.cost).toBe(9);
  });
});
