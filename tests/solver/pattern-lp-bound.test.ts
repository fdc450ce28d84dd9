// The pattern LP against the published Gilmore–Gomory LP values in ../shared/benchmarks/lp_bounds.csv
// (arc-flow LP solved with HiGHS; BPPLIB instances, Delorme, Iori & Martello 2018) and the proven
// optima (optima.csv). Our patterns never hold more of a length than its demand, which can only
// raise the LP (N1C3W2_H: 22.02 against 22.00), so its round-up must lie between the published
// round-up and the optimum, also when column generation stops early on Farley's bound.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solvePatternLp } from '@/solver/column-generation';
import { BENCHMARK_DIR, loadInstance, readOptima, toSolveInput } from '@/scripts/bench/benchmark-files';
import { buildModel } from '@/solver/model';

const published = new Map(
  readFileSync(path.join(BENCHMARK_DIR, 'lp_bounds.csv'), 'utf8')
    .trim()
    .split(/\r?\n/)
    .slice(1)
    .map((line) => line.split(','))
    .map((f) => [f[1], Number(f[2])] as const),
);
const names = ['Falkenauer_u120_00', 'Falkenauer_u120_07', 'Falkenauer_t60_03', 'N2C2W2_B', 'N1C3W2_H'];
const chosen = readOptima().filter((i) => names.includes(i.name));

describe('pattern LP matches the published LP bound', () => {
  it.each(chosen.map((c) => [c.name, c] as const))('%s', (_name, meta) => {
    const inst = loadInstance(meta);
    const model = buildModel(toSolveInput(inst, 20_000));
    const items = model.items.map((it) => ({ weight: it.weight, demand: it.count }));
    const bins = model.bins.map((b) => ({ capacity: b.capacity, cost: b.cost, limit: b.limit }));
    const lpRef = published.get(inst.name) as number;
    expect(lpRef).toBeGreaterThan(0);

    const roundUp = (v: number) => Math.ceil(v - 1e-6);
    const full = solvePatternLp(items, bins, { maxPivots: 100_000 });
    expect(full.converged).toBe(true);
    expect(roundUp(full.value)).toBeGreaterThanOrEqual(roundUp(lpRef));
    expect(roundUp(full.value)).toBeLessThanOrEqual(inst.optimum);

    // Told the optimum's cost, it may stop as soon as Farley's bound proves it: still a valid bound.
    const early = solvePatternLp(items, bins, { maxPivots: 100_000, stopAtCost: inst.optimum });
    expect(early.converged).toBe(true);
    expect(early.pivots).toBeLessThanOrEqual(full.pivots);
    expect(roundUp(early.value)).toBeGreaterThanOrEqual(roundUp(lpRef));
    expect(roundUp(early.value)).toBeLessThanOrEqual(inst.optimum);
  });
});
