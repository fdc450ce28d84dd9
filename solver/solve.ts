// The public entry point: validated job in, cheapest plan found plus its lower bound out.

import type { Pattern } from './column-generation';
import { arcFlowStep } from './arc-flow';
import { residualStep } from './residual-step';
import { exactStep } from './exact-step';
import { firstFitDecreasing, longestFirst, sequentialFill } from './greedy-fill';
import { downsizeBoards } from './board-swaps';
import { lengthBound, lpBound, maxBound } from './lower-bounds';
import { buildModel, type Model } from './model';
import { compareScores, scorePacking, type Packing } from './packing';
import { buildPlan } from './plan-builder';
import { SearchBudget } from './search-budget';
import { improvePacking, quickTargetSearch } from './improve';
import { fromUnits, toUnits } from './money';
import type { PlanBound, SolveInput, SolvePlan } from './types';

/** Iteration caps that fix the search path (see README, "Determinism"). */
export const SEARCH_CAPS = { lpPivots: 20_000 };

/** Share of the time left that the arc-flow model may use; the rest tidies the plan up. */
const ARC_FLOW_SHARE = 0.8;
/** Share of the time left for the exact solve of what LP rounding leaves over. */
const RESIDUAL_SHARE = 0.3;

export function solve(input: SolveInput): SolvePlan {
  const started = performance.now();
  const budget = new SearchBudget(input.timeLimitMs);
  const model = buildModel(input);
  const demand = model.items.map((it) => it.count);
  const limits = model.bins.map((b) => b.limit);

  let best = sequentialFill(model, demand, limits);
  const consider = (p: Packing | null) => {
    if (p && compareScores(scorePacking(model, p), scorePacking(model, best)) < 0) best = p;
  };
  const ffd = firstFitDecreasing(model, demand, limits);
  consider(ffd);
  // The plan must never cost more than the plain longest-first a yard would cut by hand: from new
  // stock only, each board then cut from the cheapest length that holds it (the reports' baseline),
  // and the same with rack offcuts first. Both come before any time check.
  const byHand = downsizeBoards(model, longestFirst(model, demand, limits));
  consider(byHand);
  consider(downsizeBoards(model, longestFirst(model, demand, limits, { offcuts: false })));

  const firstPlans = [best];
  let bound = lengthBound(model, placedDemand(model, best), limits);
  let lpPool: Pattern[] = [];
  const allPlaced = best.unplaced.every((n) => n === 0);
  if (allPlaced && !meetsBound(model, best, bound) && !budget.expired()) {
    const lengthTarget = bound.boards;
    consider(quickTargetSearch(model, best, lengthTarget, budget));
  }
  let costCap: number | null = null;
  // The complete integer model: the cheapest cost there is, or a stronger bound when time runs out.
  const runArcFlow = () => {
    if (!allPlaced || meetsBound(model, best, bound) || budget.expired()) return;
    const exact = arcFlowStep(model, demand, limits, best, budget.remainingMs() * ARC_FLOW_SHARE);
    if (!exact) return;
    consider(exact.packing);
    const cost = fromUnits(exact.proven ? scorePacking(model, best).cost : exact.boundUnits);
    bound = maxBound(bound, { boards: bound.boards, cost, method: 'integer' });
    if (exact.proven) costCap = scorePacking(model, best).cost;
  };
  // With several board kinds (a yard's job) the integer model goes first; with one kind the own
  // searches and the pattern step close most jobs faster, and the integer model gets what is left.
  const severalKinds = model.bins.length > 1;
  if (allPlaced && !meetsBound(model, best, bound) && !budget.expired()) {
    const lengthTarget = bound.boards;
    const lp = lpBound(model, demand, limits, {
      maxPivots: SEARCH_CAPS.lpPivots,
      shouldStop: budget.shouldStop,
      warmStart: best,
      stopAtCost: fromUnits(scorePacking(model, best).cost),
    });
    bound = maxBound(bound, lp?.bound ?? null);
    lpPool = lp?.pool ?? [];
    // Untrimmed boards widen the LP's patterns beyond what trimmed boards hold: bound only.
    const guide = model.relaxed ? null : lp;
    const improve = () => {
      if (meetsBound(model, best, bound) || budget.expired()) return;
      consider(improvePacking(model, best, bound, guide, budget, lengthTarget));
    };
    if (severalKinds) {
      // A yard's job: the LP is tight, so rounding it, then cutting its whole part and solving the
      // small rest exactly, gives a near-cheapest plan quickly (on a large job); the full integer
      // model then starts from the best of them, to close the gap or prove it.
      improve();
      if (guide && !meetsBound(model, best, bound) && !budget.expired())
        consider(residualStep(model, demand, limits, guide, budget.remainingMs() * RESIDUAL_SHARE));
      runArcFlow();
    } else improve();
  }
  // The pattern step: cheaper when the bound is not met, and tidier (offcuts, scrap) when it is.
  const unusedOffcuts = model.bins.some(
    (b, j) => b.source === 'offcut' && !best.boards.some((pb) => pb.bin === j),
  );
  if (allPlaced && (!meetsBound(model, best, bound) || unusedOffcuts) && !budget.expired()) {
    const plans = [...firstPlans, ffd, byHand, best];
    consider(exactStep(model, demand, limits, plans, lpPool, budget, costCap));
  }
  if (!severalKinds) runArcFlow();
  if (best.unplaced.some((n) => n > 0)) bound = lengthBound(model, placedDemand(model, best), limits);
  return buildPlan(model, best, bound, {
    timeMs: Math.round(performance.now() - started),
    stoppedByTime: budget.timedOut,
  });
}

function placedDemand(model: Model, p: Packing): number[] {
  return model.items.map((it, i) => it.count - p.unplaced[i]);
}

/** Exact, in whole money units: the bound is already rounded up to a cost a plan can have. */
export function meetsBound(model: Model, p: Packing, bound: PlanBound): boolean {
  return scorePacking(model, p).cost <= toUnits(bound.cost);
}
