// fast-check generator of varied cutting jobs: kerf 0–5, trim 0–25, several capped stock lengths,
// offcuts, nominal pieces with a tolerance, and some pieces longer than every source.
import fc from 'fast-check';
import type { SolveInput } from '@/solver/types';

export const jobArbitrary: fc.Arbitrary<SolveInput> = fc
  .record({
    kerf: fc.integer({ min: 0, max: 5 }),
    trim: fc.integer({ min: 0, max: 25 }),
    minOffcut: fc.integer({ min: 0, max: 800 }),
    stock: fc.array(
      fc.record({
        length: fc.integer({ min: 600, max: 6000 }),
        cost: fc.option(
          fc.integer({ min: 100, max: 2000 }).map((c) => c / 100),
          { nil: undefined },
        ),
        available: fc.option(fc.integer({ min: 0, max: 8 }), { nil: null }),
      }),
      { minLength: 0, maxLength: 4 },
    ),
    offcuts: fc.array(fc.integer({ min: 100, max: 3000 }), { maxLength: 6 }),
    pieces: fc.array(
      fc.record({
        length: fc.integer({ min: 20, max: 6500 }),
        quantity: fc.integer({ min: 1, max: 12 }),
        // Mostly exact pieces; some nominal ones (cladding, studs) with a few millimetres' tolerance.
        tolerance: fc.oneof(fc.constant(0), fc.constant(0), fc.integer({ min: 1, max: 10 })),
      }),
      {
        minLength: 1,
        maxLength: 8,
      },
    ),
  })
  .map((j) => ({
    kerf: j.kerf,
    trim: j.trim,
    minOffcut: j.minOffcut,
    timeLimitMs: 5000,
    stock: j.stock.map((s, k) => ({
      id: `S${k}-${s.length}`,
      length: s.length,
      cost: s.cost,
      available: s.available,
    })),
    offcuts: j.offcuts.map((length, k) => ({ id: `K-${k}`, length })),
    pieces: j.pieces.map((p, k) => ({
      id: `P${k}`,
      length: p.length,
      quantity: p.quantity,
      tolerance: Math.min(p.tolerance, p.length - 1),
    })),
  }));
