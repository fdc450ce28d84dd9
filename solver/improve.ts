// Improvement stage, run only when the first plan does not meet the lower bound.

import type { LpBoundResult } from './lower-bounds';
import { roundLpSolution } from './lp-rounding';
import type { Model } from './model';
import { compareScores, scorePacking, type Packing } from './packing';
import type { SearchBudget } from './search-budget';
import type { PlanBound } from './types';

export const IMPROVE_CAPS = { roundingSteps: 400, roundingPivots: 5_000 };

export function improvePacking(
  model: Model,
  incumbent: Packing,
  bound: PlanBound,
  lp: LpBoundResult | null,
  budget: SearchBudget,
): Packing {
  let best = incumbent;
  const consider = (p: Packing) => {
    if (compareScores(scorePacking(model, p), scorePacking(model, best)) < 0) best = p;
  };
  if (lp && !budget.expired()) {
    consider(roundLpSolution(model, lp, budget, { maxSteps: IMPROVE_CAPS.roundingSteps, maxPivots: IMPROVE_CAPS.roundingPivots }));
  }
  void bound;
  return best;
}
