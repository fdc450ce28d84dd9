// Fix the whole part of the pattern LP and solve what is left exactly: the boards the LP uses
// whole are cut as they stand, and the arc-flow model (small, because little is left) finds the
// cheapest way to cut the rest. When the LP is tight, as on yard jobs, this lands on or next to the
// cheapest plan in a fraction of the time the full integer model needs. A heuristic, not a proof.

import { arcFlowStep } from './arc-flow';
import { boardFits } from './board-fit';
import { sequentialFill } from './greedy-fill';
import type { LpBoundResult } from './lower-bounds';
import type { Model } from './model';
import { makeBoard, type PackedBoard, type Packing } from './packing';

/** Above this share of the pieces left over, the residual model is not worth solving on its own. */
const MAX_RESIDUAL_SHARE = 0.4;

export function residualStep(
  model: Model,
  demand: number[],
  limits: number[],
  lp: LpBoundResult,
  timeMs: number,
): Packing | null {
  const left = [...demand];
  const binsLeft = [...limits];
  const fixed: PackedBoard[] = [];
  const sorted = [...lp.solution].sort((a, b) => b.x - a.x || a.pattern.bin - b.pattern.bin);
  for (const { pattern, x } of sorted) {
    for (let k = 0; k < Math.floor(x + 1e-6) && binsLeft[pattern.bin] > 0; k++) {
      const items: number[] = [];
      pattern.counts.forEach((c, i) => {
        for (let n = 0; n < Math.min(c, left[i]); n++) items.push(i);
      });
      if (items.length === 0 || !boardFits(model, pattern.bin, items)) break;
      for (const i of items) left[i]--;
      binsLeft[pattern.bin]--;
      fixed.push(makeBoard(model, pattern.bin, items));
    }
  }
  if (left.every((d) => d === 0)) return { boards: fixed, unplaced: model.items.map(() => 0) };
  // With little fixed, the rest is nearly the whole job: the full model is the better use of time.
  const total = demand.reduce((s, d) => s + d, 0);
  if (left.reduce((s, d) => s + d, 0) > total * MAX_RESIDUAL_SHARE) return null;
  const rest = sequentialFill(model, left, binsLeft);
  if (rest.unplaced.some((n) => n > 0)) return null;
  const exact = arcFlowStep(model, left, binsLeft, rest, timeMs);
  const tail = exact?.packing ?? rest;
  return { boards: [...fixed, ...tail.boards], unplaced: model.items.map(() => 0) };
}
