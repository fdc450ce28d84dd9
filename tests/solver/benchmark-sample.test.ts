// A fixed-stride sample of the public benchmark sets (BPPLIB: Delorme, Iori, Martello 2018; sets by
// Falkenauer 1996 and Scholl, Klein & Jürgens 1997), read from ../shared/benchmarks. Each instance must
// reach its published optimum (optima.csv) with a valid plan. Speed is measured by `npm run bench`.
import { describe, expect, it } from 'vitest';
import { solve } from '@/solver';
import { loadInstance, readOptima, toSolveInput } from '@/scripts/bench/benchmark-files';
import { checkPlan } from './plan-checker';

const all = readOptima();
const sample = (set: string, stride: number, offset = 0) =>
  all.filter((i) => i.set === set).filter((_, k) => k % stride === offset);

const chosen = [
  ...sample('falkenauer_u120', 4),
  ...sample('falkenauer_t60', 4, 1),
  ...sample('falkenauer_t120', 5, 2),
  ...sample('scholl_1', 36, 5),
];

describe('benchmark sample reaches the known optimum', () => {
  it.each(chosen.map((c) => [c.name, c] as const))('%s', (_name, meta) => {
    const inst = loadInstance(meta);
    const input = toSolveInput(inst, 20_000);
    const plan = solve(input);
    expect(checkPlan(input, plan)).toEqual([]);
    expect(plan.lowerBound.boards).toBeLessThanOrEqual(inst.optimum);
    expect(plan.totals.boards).toBe(inst.optimum);
  });
});
