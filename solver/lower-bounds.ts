// Lower bounds on boards and cost for placing a given multiset of pieces.
// Length bound: the boards must hold the pieces' total weight (largest boards first for a count,
// cheapest per millimetre first, fractionally, for cost). LP bound: the Gilmore–Gomory pattern LP.

import { solvePatternLp, type Pattern } from './column-generation';
import type { BinType, Model } from './model';
import { costStep, fromUnits, roundBoundUp, toUnits } from './money';
import type { PackedBoard, Packing } from './packing';
import type { PlanBound } from './types';

/** What a board of this kind can hold at most under any rule (untrimmed when the job allows it). */
export function boundCapacity(model: Model, bin: BinType): number {
  return model.relaxed ? bin.openCapacity : bin.capacity;
}

/** Rounds a cost bound (price units) up to the next cost a plan of these board kinds can have. */
function roundCost(model: Model, binsLeft: number[], value: number): number {
  const step = costStep(model.bins.filter((_, j) => binsLeft[j] > 0).map((b) => b.costUnits));
  return fromUnits(roundBoundUp(value, step));
}

export function lengthBound(model: Model, demand: number[], binsLeft: number[]): PlanBound {
  let total = demand.reduce((s, n, i) => s + n * model.items[i].weight, 0);
  if (total === 0) return { boards: 0, cost: 0, method: 'length' };
  const kinds = model.bins
    .map((b, j) => ({ ...b, capacity: boundCapacity(model, b), left: binsLeft[j] }))
    .filter((b) => b.left > 0 && b.capacity > 0);
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
  return { boards, cost: roundCost(model, binsLeft, cost), method: 'length' };
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
  const bins = model.bins.map((b, j) => ({
    capacity: boundCapacity(model, b),
    cost: b.cost,
    limit: binsLeft[j],
  }));
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
  const used = model.bins.filter((_, j) => binsLeft[j] > 0);
  const costs = new Set(used.map((b) => b.costUnits));
  const uniformUnits = costs.size === 1 ? used[0].costUnits : 0;
  const pool = lp.pool;
  const cost = roundCost(model, binsLeft, lp.value);
  // With one price the rounded cost is a whole number of boards. With differing prices the board
  // count gets the length bound only: a second LP (unit costs) would double the time.
  const boards = uniformUnits > 0 ? Math.round(toUnits(cost) / uniformUnits) : 0;
  return {
    bound: { boards, cost, method: 'lp' },
    solution: lp.solution,
    pool,
  };
}

function patternOfBoard(model: Model, board: PackedBoard): Pattern {
  const counts = model.items.map(() => 0);
  for (const t of board.items) counts[t]++;
  return { bin: board.bin, counts, load: board.load };
}

export function maxBound(a: PlanBound, b: PlanBound | null): PlanBound {
  if (!b) return a;
  return {
    boards: Math.max(a.boards, b.boards),
    cost: Math.max(a.cost, b.cost),
    // The label names the source of the cost, which is what the plan is judged on.
    method: b.cost > a.cost ? b.method : a.method,
  };
}
