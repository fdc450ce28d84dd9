// Loads HiGHS, and on request warms it up. WebAssembly starts on a quick baseline compiler and
// optimises the functions that run often, so the first integer models in a process are several times
// slower than later ones; a small model solved at start-up moves that cost out of the first job. Worth
// it for a long-lived process (the bench, a worker kept for many jobs), not for one job per thread.

import { arcFlowStep } from './arc-flow';
import { sequentialFill } from './greedy-fill';
import { loadHighs } from './highs-engine';
import { buildModel } from './model';
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

let warmed: Promise<void> | null = null;

/** Loads the integer step; after it, `solve()` proves the cheapest plan where time allows. */
export async function prepareSolver(options: { warmUp?: boolean } = {}): Promise<void> {
  await loadHighs();
  if (options.warmUp) await warmUp();
}

function warmUp(): Promise<void> {
  warmed ??= Promise.resolve().then(() => {
    const model = buildModel(WARM_UP_JOB);
    const demand = model.items.map((it) => it.count);
    const limits = model.bins.map((b) => b.limit);
    const first = sequentialFill(model, demand, limits);
    for (let k = 0; k < 2; k++) arcFlowStep(model, demand, limits, first, 1000);
  });
  return warmed;
}
