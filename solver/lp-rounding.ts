// Rounding the pattern LP with residual repair: fix the whole part of every LP column, solve the
// LP again on what is left (warm-started with the known patterns), and when nothing is whole any
// more fix the largest fraction (a dive). What the LP cannot finish, the sequential fill does.

import { solvePatternLp, type Pattern } from './column-generation';
import { sequentialFill } from './greedy-fill';
import type { Model } from './model';
import { makeBoard, type Packing, type PackedBoard } from './packing';
import type { SearchBudget } from './search-budget';

export function roundLpSolution(
  model: Model,
  start: { solution: { pattern: Pattern; x: number }[]; pool: Pattern[] },
  budget: SearchBudget,
  caps: { maxSteps: number; maxPivots: number },
): Packing {
  const demand = model.items.map((it) => it.count);
  const left = model.bins.map((b) => b.limit);
  const boards: PackedBoard[] = [];
  let solution = start.solution;
  let pool = start.pool;
  for (let step = 0; step < caps.maxSteps && solution.length > 0; step++) {
    const sorted = [...solution].sort((a, b) => b.x - a.x || a.pattern.bin - b.pattern.bin);
    let fixed = 0;
    for (const { pattern, x } of sorted) {
      const copies = Math.floor(x + 1e-6);
      for (let k = 0; k < copies; k++) if (fixPattern(model, pattern, demand, left, boards)) fixed++;
    }
    if (fixed === 0) {
      // Dive: fix the largest fraction, plus further near-whole columns that still fit the demand
      // entirely, up to a tenth of the boards left, so the LP is solved again far fewer times.
      const boardsLeft = sorted.reduce((a, s) => a + s.x, 0);
      const most = Math.max(1, Math.floor(boardsLeft / 10));
      const floor = Math.max(0.5, sorted[0].x * 0.8);
      for (const { pattern, x } of sorted) {
        if (fixed >= most || (fixed > 0 && x < floor)) break;
        if (fixed > 0 && pattern.counts.some((c, i) => c > demand[i])) continue;
        if (fixPattern(model, pattern, demand, left, boards)) fixed++;
      }
      if (fixed === 0) break;
    }
    if (demand.every((d) => d === 0) || budget.expired()) break;
    const lp = solvePatternLp(
      model.items.map((it, i) => ({ weight: it.weight, demand: demand[i] })),
      model.bins.map((b, j) => ({ capacity: b.capacity, cost: b.cost, limit: left[j] })),
      { maxPivots: caps.maxPivots, pool, shouldStop: budget.shouldStop },
    );
    if (!lp.feasible) break;
    solution = lp.solution;
    pool = lp.pool;
  }
  const rest = sequentialFill(model, demand, left);
  return { boards: [...boards, ...rest.boards], unplaced: rest.unplaced };
}

/** Cuts one board to the pattern, leaving out pieces already covered; false if nothing is left to cut. */
function fixPattern(
  model: Model,
  pattern: Pattern,
  demand: number[],
  left: number[],
  boards: PackedBoard[],
): boolean {
  if (left[pattern.bin] <= 0) return false;
  const items: number[] = [];
  pattern.counts.forEach((c, i) => {
    const take = Math.min(c, demand[i]);
    for (let k = 0; k < take; k++) items.push(i);
  });
  if (items.length === 0) return false;
  for (const i of items) demand[i]--;
  left[pattern.bin]--;
  boards.push(makeBoard(model, pattern.bin, items));
  return true;
}
