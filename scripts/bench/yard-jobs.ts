// Realistic yard jobs of our own, generated deterministically from a seed (invented data, not a reference):
// 500 pieces from framing-like lengths, 6 stock lengths priced per metre, 60 offcuts on the rack.
import type { SolveInput } from '@/solver/types';

/** mulberry32: a small, well-known 32-bit PRNG; enough for reproducible test data. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function generateYardJob(seed: number, timeLimitMs = 2000): SolveInput {
  const rnd = seededRandom(seed);
  const int = (lo: number, hi: number) => lo + Math.floor(rnd() * (hi - lo + 1));
  const stockLengths = [2400, 3000, 3600, 4200, 4800, 5400];
  const stock = stockLengths.map((length) => ({
    id: `S${length}`,
    length,
    cost: Math.round(length * (2.1 + length / 20000)) / 1000,
    available: length === 5400 ? int(10, 30) : null,
  }));
  const offcuts = Array.from({ length: 60 }, (_, k) => ({
    id: `K-${String(k + 1).padStart(4, '0')}`,
    length: int(300, 2600),
  }));
  const pieces: SolveInput['pieces'] = [];
  let left = 500;
  for (let line = 0; left > 0; line++) {
    const kind = rnd();
    const length =
      kind < 0.3
        ? int(2200, 2500)
        : kind < 0.55
          ? int(350, 650)
          : kind < 0.8
            ? int(900, 1800)
            : int(2600, 4600);
    const quantity = Math.min(left, int(1, 24));
    pieces.push({ id: `L${line + 1}`, length, quantity });
    left -= quantity;
  }
  return { kerf: 3, trim: 10, minOffcut: 300, timeLimitMs, stock, offcuts, pieces };
}
