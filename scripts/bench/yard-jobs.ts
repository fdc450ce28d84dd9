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

/**
 * A yard's job at the sizes of the cutting-engine issue (invented data of our own, not a reference):
 * one section; 4–8 stock lengths, priced per metre a little higher for longer lengths, some capped;
 * 0–40 free offcuts on the rack; kerf 3–5, trim 0–15; 8–600 pieces from 2–12 cut-list lines.
 */
export function generateSizedYardJob(seed: number, timeLimitMs = 1000): SolveInput {
  const rnd = seededRandom(seed * 7919 + 17);
  const int = (lo: number, hi: number) => lo + Math.floor(rnd() * (hi - lo + 1));
  const allLengths = [1800, 2400, 2700, 3000, 3600, 4200, 4800, 5400, 6000, 6600, 7200];
  const kinds = int(4, 8);
  const start = int(0, allLengths.length - kinds);
  const perMetre = int(180, 650) / 100;
  const stock = allLengths.slice(start, start + kinds).map((length) => ({
    id: `S${length}`,
    length,
    cost: Math.round(perMetre * (length / 1000) * (1 + 0.015 * (length / 1000 - 1.8)) * 100) / 100,
    available: rnd() < 0.3 ? int(0, 12) : null,
  }));
  // The longest length is never capped, so every piece can be placed and the optimum is defined.
  stock[stock.length - 1].available = null;
  const longest = Math.max(...stock.filter((s) => s.available !== 0).map((s) => s.length), 1800);
  const offcuts = Array.from({ length: int(0, 40) }, (_, k) => ({
    id: `K-${String(k + 1).padStart(4, '0')}`,
    length: int(300, 3000),
  }));
  const lines = int(2, 12);
  const total = rnd() < 0.5 ? int(8, 60) : int(60, 600);
  const pieces: SolveInput['pieces'] = [];
  const stockLengths = new Set(stock.map((s) => s.length));
  let left = total;
  for (let line = 0; line < lines && left > 0; line++) {
    let length = int(250, Math.min(longest - 40, 5800));
    if (stockLengths.has(length)) length -= 1;
    const quantity =
      line === lines - 1 ? left : Math.max(1, Math.min(left, int(1, Math.ceil((2 * total) / lines))));
    pieces.push({ id: `L${line + 1}`, length, quantity });
    left -= quantity;
  }
  return { kerf: int(3, 5), trim: int(0, 15), minOffcut: 300, timeLimitMs, stock, offcuts, pieces };
}
