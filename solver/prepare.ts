// Loads HiGHS, and on request warms it up. WebAssembly starts on a quick baseline compiler and
// optimises the functions that run often, so the first integer models in a process are several times
// slower than later ones; a small model solved at start-up moves that cost out of the first job. Worth
// it for a long-lived process (the bench, a worker kept for many jobs), not for one job per thread.

import { arcFlowStep } from './arc-flow';
import { sequentialFill } from './greedy-fill';
import { loadHighs } from './highs-engine';
import { buildModel } from './model';
import { solve } from './solve';
import type { SolveInput } from './types';

/** A small invented job whose integer model needs cuts and branching, not just its first LP. */
const WARM_UP_JOB: SolveInput = {
  kerf: 3,
  trim: 5,
  minOffcut: 300,
  timeLimitMs: 2000,
  stock: [
    { id: 'W24', length: 2400, cost: 4.1 },
    { id: 'W36', length: 3600, cost: 6.3 },
    { id: 'W48', length: 4800, cost: 8.6 },
    { id: 'W60', length: 6000, cost: 11.05 },
  ],
  offcuts: [
    { id: 'R1', length: 1900 },
    { id: 'R2', length: 1400 },
  ],
  pieces: [
    { id: 'a', length: 2650, quantity: 3 },
    { id: 'b', length: 2100, quantity: 4 },
    { id: 'c', length: 1350, quantity: 5 },
    { id: 'd', length: 900, quantity: 7 },
    { id: 'e', length: 450, quantity: 9 },
  ],
};

/** Two yard-sized invented jobs (framing lengths, a rack of offcuts), for the rest of HiGHS's code. */
const WARM_UP_YARD_JOBS: SolveInput[] = [
  {
    kerf: 4,
    trim: 10,
    minOffcut: 300,
    timeLimitMs: 2000,
    stock: [
      { id: 'F30', length: 3000, cost: 19.2 },
      { id: 'F36', length: 3600, cost: 23.3 },
      { id: 'F42', length: 4200, cost: 27.4, available: 5 },
      { id: 'F48', length: 4800, cost: 31.55 },
      { id: 'F54', length: 5400, cost: 35.8 },
      { id: 'F60', length: 6000, cost: 40.1 },
    ],
    offcuts: [1210, 2770, 1745, 2530, 1920, 1040, 760, 2890, 1320, 2180, 870, 1660].map((length, k) => ({
      id: `R${k + 1}`,
      length,
    })),
    pieces: [
      { id: 'stud', length: 2710, quantity: 6 },
      { id: 'plate', length: 3390, quantity: 22 },
      { id: 'rafter', length: 5120, quantity: 30 },
      { id: 'trimmer', length: 1480, quantity: 18 },
      { id: 'ridge', length: 4870, quantity: 12 },
      { id: 'noggin', length: 690, quantity: 40 },
      { id: 'header', length: 2205, quantity: 9 },
    ],
  },
  {
    kerf: 3,
    trim: 5,
    minOffcut: 300,
    timeLimitMs: 2000,
    stock: [
      { id: 'G36', length: 3600, cost: 20.9, available: 8 },
      { id: 'G42', length: 4200, cost: 24.6 },
      { id: 'G48', length: 4800, cost: 28.3, available: 2 },
      { id: 'G54', length: 5400, cost: 32.1 },
      { id: 'G60', length: 6000, cost: 36.0 },
      { id: 'G66', length: 6600, cost: 39.9 },
    ],
    offcuts: [2650, 320, 1415, 1080, 1990, 860].map((length, k) => ({ id: `R${k + 1}`, length })),
    pieces: [
      { id: 'stud', length: 2260, quantity: 10 },
      { id: 'noggin', length: 405, quantity: 100 },
      { id: 'blocking', length: 830, quantity: 90 },
      { id: 'lintel', length: 955, quantity: 5 },
    ],
  },
];

/** Wall-clock cap per warm-up model, so a job that arrives meanwhile does not wait long. */
const WARM_UP_MS = 1500;

let warmed: Promise<void> | null = null;

/** Loads the integer step; after it, `solve()` proves the cheapest plan where time allows. */
export async function prepareSolver(options: { warmUp?: boolean } = {}): Promise<void> {
  await loadHighs();
  if (options.warmUp) await warmUp();
}

function warmUp(): Promise<void> {
  warmed ??= Promise.resolve().then(() => {
    // WebAssembly and JavaScript both run new code on quick baseline compilers first and optimise it
    // as it runs. One small model left most of HiGHS (cuts, sub-MIPs, branching) and the engine's own
    // steps cold, so the first real jobs ran 4–10× slower (measured: 1.35 s of processor time for a
    // yard job's integer model cold, 0.2–0.3 s warm; the first plans and the LP of a 470-piece job
    // 0.5–1 s cold, under 0.1 s warm). So the yard-sized jobs go through the whole engine as well.
    const model = buildModel(WARM_UP_JOB);
    const demand = model.items.map((it) => it.count);
    const limits = model.bins.map((b) => b.limit);
    arcFlowStep(model, demand, limits, sequentialFill(model, demand, limits), WARM_UP_MS);
    for (const job of WARM_UP_YARD_JOBS) solve({ ...job, timeLimitMs: WARM_UP_MS });
  });
  return warmed;
}
