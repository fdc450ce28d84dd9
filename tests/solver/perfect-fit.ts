// Cutting-stock instances with an optimum known by construction ("perfect fit"): `boards` boards of
// one capacity are each cut into pieces whose lengths add up to exactly the capacity. The pieces then
// total boards × capacity, so no plan uses fewer boards (and the LP relaxation cannot go lower
// either), while the construction itself is a plan with exactly that many: optimum = LP = boards.
// The shapes follow the published benchmark classes (Falkenauer 1996: "uniform" pieces, and
// "triplets" of three pieces per bin; Scholl, Klein & Jürgens 1997), generated here, not copied.
import type { SolveInput } from '@/solver/types';

/** Small seeded generator (mulberry32), so every run tests the same instances. */
function seeded(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface PerfectFitInstance {
  name: string;
  capacity: number;
  /** The optimum by construction: the number of boards the pieces were cut from. */
  optimum: number;
  pieces: number[];
}

/** Each board cut into three pieces strictly between a quarter and a half of it (Falkenauer's triplets). */
export function triplets(seed: number, boards: number, capacity = 1000): PerfectFitInstance {
  const random = seeded(seed);
  const pieces: number[] = [];
  const quarter = capacity / 4;
  for (let b = 0; b < boards; b++) {
    for (;;) {
      const first = Math.floor(quarter + 1 + random() * (quarter - 1));
      const second = Math.floor(quarter + 1 + random() * (quarter - 1));
      const third = capacity - first - second;
      if (third > quarter && third < 2 * quarter) {
        pieces.push(first, second, third);
        break;
      }
    }
  }
  return { name: `triplets-${boards}-s${seed}`, capacity, optimum: boards, pieces };
}

/** Each board cut at random places into two to five pieces no shorter than `minPiece`. */
export function randomCuts(
  seed: number,
  boards: number,
  capacity = 1000,
  minPiece = 100,
): PerfectFitInstance {
  const random = seeded(seed);
  const pieces: number[] = [];
  for (let b = 0; b < boards; b++) {
    const count = 2 + Math.floor(random() * 4);
    let left = capacity;
    for (let p = count; p > 1; p--) {
      const most = left - (p - 1) * minPiece;
      const length = minPiece + Math.floor(random() * (most - minPiece + 1));
      pieces.push(length);
      left -= length;
    }
    pieces.push(left);
  }
  return { name: `cuts-${boards}-s${seed}`, capacity, optimum: boards, pieces };
}

/** Bin packing on the solver contract: no kerf, no trim, unit cost, unlimited stock, shuffled demand. */
export function toSolveInput(inst: PerfectFitInstance, timeLimitMs: number): SolveInput {
  const demand = new Map<number, number>();
  for (const length of inst.pieces) demand.set(length, (demand.get(length) ?? 0) + 1);
  return {
    kerf: 0,
    trim: 0,
    minOffcut: 0,
    timeLimitMs,
    stock: [{ id: 'bin', length: inst.capacity, cost: 1, available: null }],
    offcuts: [],
    pieces: [...demand].map(([length, quantity]) => ({ id: `p${length}`, length, quantity })),
  };
}
