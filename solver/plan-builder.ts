// Turns the engine's packing into the public plan: piece ids in cut order, marks, remainders, totals.

import { isFullLength, isOpenBoard } from './board-fit';
import { layOutBoard, usableLength } from './kerf';
import { fromUnits, toUnits } from './money';
import type { Model } from './model';
import { isKept, type Packing } from './packing';
import type { PlanBoard, PlanBound, PlanTotals, SolvePlan, StockUsage, UnplacedPiece } from './types';

export function buildPlan(
  model: Model,
  packing: Packing,
  bound: PlanBound,
  meta: { timeMs: number; stoppedByTime: boolean },
): SolvePlan {
  const queues = model.items.map((it) => [...it.ids]);
  const unplaced: UnplacedPiece[] = [...model.tooLong];
  packing.unplaced.forEach((n, i) => {
    for (let k = 0; k < n; k++) {
      unplaced.push({
        id: queues[i].pop() as string,
        length: model.items[i].length,
        reason: 'not-enough-stock',
      });
    }
  });
  const ordered = [...packing.boards].sort((a, b) => {
    const ba = model.bins[a.bin];
    const bb = model.bins[b.bin];
    if (ba.source !== bb.source) return ba.source === 'offcut' ? -1 : 1;
    return bb.length - ba.length || a.bin - b.bin || b.load - a.load || compareItems(a.items, b.items);
  });
  const boards: PlanBoard[] = ordered.map((pb) => {
    const bin = model.bins[pb.bin];
    const open = isOpenBoard(model, bin, pb.items);
    const trim = bin.source === 'stock' && !open ? model.trim : 0;
    const usable = trim > 0 ? usableLength(bin.length, model.trim, model.kerf) : bin.length;
    const pieceLengths = pb.items.map((i) => model.items[i].length);
    const fullLength = isFullLength(model, bin, pb.items);
    const cutLengths = fullLength
      ? [bin.length]
      : shortenToFit(
          pieceLengths,
          pb.items.map((i) => model.items[i].tolerance),
          usable,
          model.kerf,
        );
    const pieces = pb.items.map((i) => queues[i].shift() as string);
    const layout = layOutBoard(usable, cutLengths, model.kerf);
    const keepRemainder = isKept(model, layout.remainder);
    const trimKerf = trim > 0 ? model.kerf : 0;
    return {
      sourceId: bin.id,
      source: bin.source,
      length: bin.length,
      trim,
      pieces,
      pieceLengths,
      cutLengths,
      fullLength,
      marks: layout.marks,
      remainder: layout.remainder,
      keepRemainder,
      kerfLoss: layout.kerfLoss + trimKerf,
      scrap: trim + (keepRemainder ? 0 : layout.remainder),
      cost: bin.cost,
    };
  });
  const totals = sumTotals(boards);
  const planUnits = ordered.reduce((s, pb) => s + model.bins[pb.bin].costUnits, 0);
  const gapUnits = Math.max(0, planUnits - toUnits(bound.cost));
  const gapBoards = totals.boards - bound.boards;
  return {
    boards,
    unplaced,
    totals,
    lowerBound: bound,
    gap: { boards: gapBoards, cost: fromUnits(gapUnits) },
    provenOptimal: gapUnits === 0,
    stoppedByTime: meta.stoppedByTime,
    timeMs: meta.timeMs,
  };
}

function sumTotals(boards: PlanBoard[]): PlanTotals {
  const usage = new Map<string, StockUsage>();
  let offcutsUsed = 0;
  let materialLength = 0;
  let pieceLength = 0;
  let cost = 0;
  let kerfLoss = 0;
  let scrap = 0;
  let keptOffcuts = 0;
  let keptLength = 0;
  for (const b of boards) {
    if (b.source === 'offcut') offcutsUsed++;
    else {
      const u = usage.get(b.sourceId) ?? { sourceId: b.sourceId, length: b.length, boards: 0 };
      u.boards++;
      usage.set(b.sourceId, u);
    }
    materialLength += b.length;
    pieceLength += b.cutLengths.reduce((s, l) => s + l, 0);
    cost += b.cost;
    kerfLoss += b.kerfLoss;
    scrap += b.scrap;
    if (b.keepRemainder) {
      keptOffcuts++;
      keptLength += b.remainder;
    }
  }
  const consumed = materialLength - keptLength;
  return {
    boards: boards.length,
    stockBoards: [...usage.values()],
    offcutsUsed,
    materialLength,
    pieceLength,
    cost: round6(cost),
    kerfLoss,
    scrap,
    keptOffcuts,
    keptLength,
    yieldPercent: consumed > 0 ? Math.round((10000 * pieceLength) / consumed) / 100 : 0,
  };
}

function compareItems(a: number[], b: number[]): number {
  for (let k = 0; k < Math.min(a.length, b.length); k++) if (a[k] !== b[k]) return a[k] - b[k];
  return a.length - b.length;
}

export function round6(x: number): number {
  return Math.round(x * 1e6) / 1e6;
}

/**
 * Nominal pieces are cut at their ordered length where the board allows; when it does not, they
 * give up to their tolerance, a millimetre at a time in turn, until the pieces and kerfs fit.
 */
export function shortenToFit(
  lengths: number[],
  tolerances: number[],
  usable: number,
  kerf: number,
): number[] {
  const cut = [...lengths];
  let over = lengths.reduce((s, l) => s + l, 0) + (lengths.length - 1) * kerf - usable;
  const slack = [...tolerances];
  while (over > 0) {
    const active = slack.filter((t) => t > 0).length;
    if (active === 0) break;
    const share = Math.max(1, Math.floor(over / active));
    for (let k = 0; k < cut.length && over > 0; k++) {
      const take = Math.min(share, slack[k], over);
      cut[k] -= take;
      slack[k] -= take;
      over -= take;
    }
  }
  return cut;
}
