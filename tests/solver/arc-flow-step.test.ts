import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareSolver } from '@/solver';
import { arcFlowStep } from '@/solver/arc-flow';
import { boardPath, buildArcFlowGraph } from '@/solver/arc-flow-graph';
import { sequentialFill } from '@/solver/greedy-fill';
import { buildModel } from '@/solver/model';
import { buildPlan } from '@/solver/plan-builder';
import { fromUnits } from '@/solver/money';
import type { SolveInput } from '@/solver/types';
import { arcFlowCost, bruteForceCost } from './exact-reference';
import { yardJob } from './job-arbitrary';
import { checkPlan } from './plan-checker';

// The compressed arc-flow step on its own (not through solve(), whose earlier steps often prove a
// job before it runs): its proven cost must equal an exact reference written independently in
// exact-reference.ts, and its plan must pass the independent checker.

beforeAll(async () => {
  await prepareSolver();
});

function runStep(job: SolveInput) {
  const model = buildModel(job);
  const demand = model.items.map((it) => it.count);
  const limits = model.bins.map((b) => b.limit);
  const result = arcFlowStep(model, demand, limits, sequentialFill(model, demand, limits), 20_000);
  expect(result).not.toBeNull();
  expect(result!.proven).toBe(true);
  const cost = fromUnits(result!.boundUnits);
  const plan = buildPlan(
    model,
    result!.packing!,
    { boards: 0, cost, method: 'integer' },
    { timeMs: 0, stoppedByTime: false },
  );
  expect(checkPlan(job, plan)).toEqual([]);
  expect(plan.unplaced).toEqual([]);
  return { plan, boundPence: Math.round(cost * 100) };
}

describe('compressed arc-flow step', () => {
  it('proves the brute-force optimum on tiny jobs (nominal and full-length pieces too)', () => {
    fc.assert(
      fc.property(
        yardJob(3, true).filter((j) => j.pieces.reduce((s, p) => s + p.quantity, 0) <= 6),
        (job) => {
          const { plan, boundPence } = runStep(job);
          const best = bruteForceCost(job);
          expect(Math.round(plan.totals.cost * 100)).toBe(best);
          expect(boundPence).toBe(best);
        },
      ),
      { numRuns: 40, seed: 20261204 },
    );
  });

  it('proves the arc-flow reference optimum on small exact jobs', async () => {
    await fc.assert(
      fc.asyncProperty(yardJob(15, false), async (job) => {
        const { plan, boundPence } = runStep(job);
        const best = await arcFlowCost(job, 30);
        expect(best).not.toBeNull();
        expect(Math.round(plan.totals.cost * 100)).toBe(best);
        expect(boundPence).toBe(best);
      }),
      { numRuns: 25, seed: 20261205 },
    );
  });

  it('keeps every pattern and only patterns that fit: any set of pieces that fits a board has a path', () => {
    fc.assert(
      fc.property(
        yardJob(6, true),
        fc.array(fc.nat(), { minLength: 1, maxLength: 12 }),
        fc.nat(),
        (job, picks, binPick) => {
          const model = buildModel(job);
          const demand = model.items.map((it) => it.count);
          const caps = model.bins.map((b, bin) => ({ bin, cap: b.capacity }));
          const graph = buildArcFlowGraph(model, demand, () => true, caps, Infinity)!;
          // Every path fits its board: each arc climbs at least its piece's weight, every kind
          // starts at or after top − capacity, and all paths end at `top`.
          graph.arcItem.forEach((i, a) => {
            const rise = graph.labels[graph.arcTo[a]] - graph.labels[graph.arcFrom[a]];
            expect(rise).toBeGreaterThanOrEqual(i >= 0 ? model.items[i].weight : 0);
          });
          for (const e of graph.entries)
            expect(graph.labels[e.node]).toBeGreaterThanOrEqual(graph.top - model.bins[e.bin].capacity);
          expect(graph.labels[graph.end]).toBe(graph.top);
          const bin = binPick % model.bins.length;
          // Greedy: add picked pieces while they fit the trimmed board and stay within demand.
          const left = [...demand];
          const items: number[] = [];
          let load = 0;
          for (const p of picks) {
            const i = p % model.items.length;
            if (left[i] === 0 || load + model.items[i].weight > model.bins[bin].capacity) continue;
            left[i]--;
            load += model.items[i].weight;
            items.push(i);
          }
          fc.pre(items.length > 0);
          const path = boardPath(model, graph, model.bins[bin].capacity, items);
          expect(path).not.toBeNull();
          // The path holds exactly these pieces.
          const onPath = path!.map((a) => graph.arcItem[a]).filter((i) => i >= 0);
          expect(onPath.sort()).toEqual([...items].sort());
        },
      ),
      { numRuns: 200, seed: 20261206 },
    );
  });
});
