// Reads the public bin-packing benchmark sets (BPPLIB) from ../shared/benchmarks beside the repository.
// Their licence keeps them out of the repository, so only `npm run bench` uses them, never the tests.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { SolveInput } from '@/solver/types';

// ../shared/benchmarks beside the repository; BENCHMARK_DIR overrides it (e.g. from a git worktree).
export const BENCHMARK_DIR =
  process.env.BENCHMARK_DIR ??
  path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../shared/benchmarks');

export interface BenchmarkInstance {
  set: string;
  name: string;
  capacity: number;
  items: number;
  optimum: number;
  ceilLp: number;
  /** Piece lengths and their demands, from the cutting-stock (csp) file. */
  lengths: { length: number; demand: number }[];
}

export function readOptima(): BenchmarkInstance[] {
  if (!existsSync(path.join(BENCHMARK_DIR, 'optima.csv'))) {
    throw new Error(
      `npm run bench expects the BPPLIB benchmark sets in ${BENCHMARK_DIR} ` +
        '(optima.csv, lp_bounds.csv and one folder per set with csp/<instance>.txt). ' +
        'They are not part of the repository; put them there to run the benchmark.',
    );
  }
  const lines = readFileSync(path.join(BENCHMARK_DIR, 'optima.csv'), 'utf8').trim().split(/\r?\n/).slice(1);
  const lp = new Map<string, number>();
  for (const l of readFileSync(path.join(BENCHMARK_DIR, 'lp_bounds.csv'), 'utf8')
    .trim()
    .split(/\r?\n/)
    .slice(1)) {
    const f = l.split(',');
    lp.set(f[1], Number(f[3]));
  }
  return lines.map((line) => {
    const [set, name, capacity, items, optimum] = line.split(',');
    return {
      set,
      name,
      capacity: Number(capacity),
      items: Number(items),
      optimum: Number(optimum),
      ceilLp: lp.get(name) ?? 0,
      lengths: [],
    };
  });
}

export function loadInstance(inst: BenchmarkInstance): BenchmarkInstance {
  const text = readFileSync(path.join(BENCHMARK_DIR, inst.set, 'csp', `${inst.name}.txt`), 'utf8');
  const nums = text.split(/\s+/).filter(Boolean).map(Number);
  const m = nums[0];
  const lengths: { length: number; demand: number }[] = [];
  for (let k = 0; k < m; k++) lengths.push({ length: nums[2 + 2 * k], demand: nums[3 + 2 * k] });
  return { ...inst, capacity: nums[1], lengths };
}

/** Bin packing mapped onto the contract: no kerf, no trim, unit cost, unlimited stock. */
export function toSolveInput(inst: BenchmarkInstance, timeLimitMs: number): SolveInput {
  return {
    kerf: 0,
    trim: 0,
    minOffcut: 0,
    timeLimitMs,
    stock: [{ id: 'bin', length: inst.capacity, cost: 1, available: null }],
    offcuts: [],
    pieces: inst.lengths.map((l, k) => ({ id: `w${k}-${l.length}`, length: l.length, quantity: l.demand })),
  };
}
