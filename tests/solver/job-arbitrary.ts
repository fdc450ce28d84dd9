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

// Generated yard jobs (invented, our own generator): a few stock lengths priced a little higher per
// metre for longer lengths, some capped, free offcuts, kerf 3–5, trim 0–15. Used to hold the solver's
// cost against the exact references written independently in exact-reference.ts.
export const yardJob = (maxPieces: number, nominal: boolean): fc.Arbitrary<SolveInput> =>
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
