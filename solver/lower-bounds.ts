// Lower bounds on boards and cost for placing a given multiset of pieces.
// Length bound: the boards must hold the pieces' total weight (largest boards first for a count,
// cheapest per millimetre first, fractionally, for cost). LP bound: the Gilmore–Gomory pattern LP.

import { solvePatternLp, type Pattern } from './column-generation';
import type { Model } from './model';
import type { PackedBoard, Packing } from './packing';
import type { PlanBound } from './types';

const SLACK = 1e-6;

export function lengthBound(model: Model, demand: number[], binsLeft: number[]): PlanBound {
  let total = demand.reduce((s, n, i) => s + n * model.items[i].weight, 0);
  if (total === 0) return { boards: 0, cost: 0, method: 'length' };
  const kinds = model.bins.map((b, j) => ({ ...b, left: binsLeft[j] })).filter((b) => b.left > 0);
  let boards = 0;
  let need = total;
  for (const b of [...kinds].sort((a, c) => c.capacity - a.capacity)) {
    if (need <= 0) break;
    const take = Math.min(b.left, Math.ceil(need / b.capacity));
    boards += take;
    need -= take * b.capacity;
  }
  let cost = 0;
  for (const b of [...kinds].sort(
    (a, c) => a.cost / a.capacity - c.cost / c.capacity || c.capacity - a.capacity,
  )) {
    if (total <= 0) break;
    const amount = Math.min(total, b.left * b.capacity);
    cost += (amount / b.capacity) * b.cost;
    total -= amount;
  }
  return { boards, cost: floor6(cost), method: 'length' };
}

export interface LpBoundResult {
  bound: PlanBound | null;
  /** LP solution for the cost objective, used by the rounding heuristic. */
  solution: { pattern: Pattern; x: number }[];
  pool: Pattern[];
}

export function lpBound(
  model: Model,
  demand: number[],
  binsLeft: number[],
  opts: { maxPivots: number; shouldStop: () => boolean; warmStart?: Packing; stopAtCost?: number },
): LpBoundResult | null {
  const items = model.items.map((it, i) => ({ weight: it.weight, demand: demand[i] }));
  const bins = model.bins.map((b, j) => ({ capacity: b.capacity, cost: b.cost, limit: binsLeft[j] }));
  // The boards of a known plan are good first columns: they roughly halve the simplex pivots.
  const warmPool = opts.warmStart?.boards.map((b) => patternOfBoard(model, b));
  const lp = solvePatternLp(items, bins, {
    maxPivots: opts.maxPivots,
    shouldStop: opts.shouldStop,
    stopAtCost: opts.stopAtCost,
    pool: warmPool,
  });
  if (!lp.feasible) return null;
  // Stopped early: the LP solution still guides rounding, but its value proves nothing.
  if (!lp.converged) return { bound: null, solution: lp.solution, pool: lp.pool };
  const costs = new Set(bins.map((b) => b.cost));
  const uniformCost = costs.size === 1 ? bins[0].cost : 0;
  let boards: number;
  let cost = lp.value;
  const pool = lp.pool;
  if (uniformCost > 0) {
    boards = Math.ceil(lp.value / uniformCost - SLACK);
    cost = boards * uniformCost;
  } else {
    // With differing costs the board count gets the length bound only: a second LP (unit costs)
    // would double the time, and the cost is what the plan is judged on.
    boards = 0;
  }
  return {
    bound: { boards, cost: floor6(cost - SLACK * Math.max(1, cost)), method: 'lp' },
    solution: lp.solution,
    pool,
  };
}

function patternOfBoard(model: Model, board: PackedBoard): Pattern {
  const counts = model.items.map(() => 0);
  for (const t of board.items) counts[t]++;
  return { bin: board.bin, counts, load: board.load };
}

function floor6(x: number): number {
  return Math.floor(x * 1e6 + 1e-9) / 1e6;
}

export function maxBound(a: PlanBound, b: PlanBound | null): PlanBound {
  if (!b) return a;
  return {
    boards: Math.max(a.boards, b.boards),
    cost: Math.max(a.cost, b.cost),
    method: b.boards >= a.boards && b.cost >= a.cost ? b.method : a.method,
  };
}
