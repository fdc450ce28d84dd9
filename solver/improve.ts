// Improvement stage, run only when the first plan does not meet the lower bound. With one board
// kind: a short bin completion towards the bound first. Then LP rounding with residual repair,
// and (one board kind) pool-based repacking of the rounded plan, then of the best plan.

import { downsizeBoards, mergeBoards } from './board-swaps';
import { packIntoTarget, type CompletionCaps } from './bin-completion';
import type { LpBoundResult } from './lower-bounds';
import { roundLpSolution } from './lp-rounding';
import type { Model } from './model';
import { toUnits } from './money';
import { compareScores, makeBoard, scorePacking, type Packing } from './packing';
import type { SearchBudget } from './search-budget';
import { repackToTarget, type RepackCaps } from './target-repack';
import type { PlanBound } from './types';

export const IMPROVE_CAPS = {
  roundingSteps: 400,
  roundingPivots: 5_000,
  completion: {
    maxNodes: 3_000,
    branching: 8,
    listSteps: 20_000,
    failFirstBudgetShare: 0.34,
    maxDiscrepancies: Infinity,
  } satisfies CompletionCaps,
  repack: { maxRounds: 400, starts: 6 } satisfies RepackCaps,
  quickTightCompletion: {
    maxNodes: 800,
    branching: 8,
    listSteps: 20_000,
    failFirstBudgetShare: 0.34,
    maxDiscrepancies: Infinity,
  } satisfies CompletionCaps,
  quickCompletion: {
    maxNodes: 300,
    branching: 6,
    listSteps: 4_000,
    failFirstBudgetShare: 0.34,
    maxDiscrepancies: Infinity,
  } satisfies CompletionCaps,
};

export function improvePacking(
  model: Model,
  incumbent: Packing,
  bound: PlanBound,
  lp: LpBoundResult | null,
  budget: SearchBudget,
  lengthTarget: number,
): Packing {
  let best = incumbent;
  const better = (p: Packing | null): boolean => {
    if (p && compareScores(scorePacking(model, p), scorePacking(model, best)) < 0) best = p;
    return scorePacking(model, best).cost <= toUnits(bound.cost);
  };
  const oneKind = model.bins.length === 1 && bound.boards <= model.bins[0].limit;
  // LP-guided bin completion: among equally full completions, boards the LP uses come first.
  const guided = () =>
    oneKind &&
    !budget.expired() &&
    better(completeTowardsBound(model, bound.boards, budget, IMPROVE_CAPS.completion, lp));
  const tight = oneKind && isTight(model, bound.boards);
  if (tight && (bound.boards > lengthTarget || lp) && guided()) return best;
  if (lp && !budget.expired()) {
    const rounded = roundLpSolution(model, lp, budget, {
      maxSteps: IMPROVE_CAPS.roundingSteps,
      maxPivots: IMPROVE_CAPS.roundingPivots,
    });
    if (better(rounded)) return best;
    if (oneKind && !budget.expired() && better(repackTowardsBound(model, rounded, bound.boards, budget)))
      return best;
  }
  if (oneKind && !tight && guided()) return best;
  if (oneKind && !budget.expired()) better(repackTowardsBound(model, best, bound.boards, budget));
  if (!oneKind) better(downsizeBoards(model, mergeBoards(model, best, 60)));
  return best;
}

/** Little waste allowed at this board count: bin completion's home ground. */
function isTight(model: Model, target: number): boolean {
  const slack = target * model.bins[0].capacity - model.items.reduce((s, it) => s + it.weight * it.count, 0);
  return slack <= IMPROVE_CAPS.completion.failFirstBudgetShare * model.bins[0].capacity;
}

function completeTowardsBound(
  model: Model,
  target: number,
  budget: SearchBudget,
  caps: CompletionCaps = IMPROVE_CAPS.completion,
  lp: LpBoundResult | null = null,
): Packing | null {
  const guide = lp ? new Map(lp.solution.map((s) => [s.pattern.counts.join(','), s.x] as const)) : undefined;
  const found = packIntoTarget(
    model.items.map((it) => it.weight),
    model.items.map((it) => it.count),
    model.bins[0].capacity,
    target,
    caps,
    budget.shouldStop,
    guide,
  );
  return found
    ? { boards: found.map((items) => makeBoard(model, 0, items)), unplaced: model.items.map(() => 0) }
    : null;
}

/** Repacks one board fewer at a time, down to the target; returns the smallest plan reached. */
function repackTowardsBound(
  model: Model,
  from: Packing,
  target: number,
  budget: SearchBudget,
  caps: RepackCaps = IMPROVE_CAPS.repack,
): Packing | null {
  let best: Packing | null = null;
  let current = from;
  while (current.boards.length > target && !budget.expired()) {
    const next = repackOnce(model, current, current.boards.length - 1, budget, caps);
    if (!next) break;
    best = current = next;
  }
  return best;
}

/** Before any LP: a short bin completion towards the length bound (one board kind). */
export function quickTargetSearch(
  model: Model,
  incumbent: Packing,
  target: number,
  budget: SearchBudget,
): Packing {
  if (model.bins.length !== 1 || target > model.bins[0].limit) return incumbent;
  // Repacking the greedy plan here rarely paid off in the benchmarks; the LP-rounded plan is a better
  // start. Bin completion is strong when little waste is allowed (exact fills), weak otherwise.
  const caps = isTight(model, target) ? IMPROVE_CAPS.quickTightCompletion : IMPROVE_CAPS.quickCompletion;
  return completeTowardsBound(model, target, budget, caps) ?? incumbent;
}

function repackOnce(
  model: Model,
  from: Packing,
  target: number,
  budget: SearchBudget,
  caps: RepackCaps,
): Packing | null {
  if (from.unplaced.some((n) => n > 0) || from.boards.length <= target) return null;
  const pieceType: number[] = [];
  const initial = from.boards.map((b) =>
    b.items.map((t) => {
      pieceType.push(t);
      return pieceType.length - 1;
    }),
  );
  const weights = pieceType.map((t) => model.items[t].weight);
  const found = repackToTarget(weights, model.bins[0].capacity, target, initial, caps, budget.shouldStop);
  if (!found) return null;
  return {
    boards: found
      .filter((b) => b.length > 0)
      .map((b) =>
        makeBoard(
          model,
          0,
          b.map((p) => pieceType[p]),
        ),
      ),
    unplaced: model.items.map(() => 0),
  };
}
