// Turns the engine's packing into the public plan: piece ids in cut order, marks, remainders, totals.

import { layOutBoard, usableLength } from './kerf';
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
    const trim = bin.source === 'stock' ? model.trim : 0;
    const usable = bin.source === 'stock' ? usableLength(bin.length, model.trim, model.kerf) : bin.length;
    const pieceLengths = pb.items.map((i) => model.items[i].length);
    const pieces = pb.items.map((i) => queues[i].shift() as string);
    const layout = layOutBoard(usable, pieceLengths, model.kerf);
    const remainderKept = isKept(model, layout.remainder);
    const trimKerf = trim > 0 ? model.kerf : 0;
    return {
      sourceId: bin.id,
      source: bin.source,
      length: bin.length,
      trim,
      pieces,
      pieceLengths,
      marks: layout.marks,
      remainder: layout.remainder,
      remainderKept,
      kerfLoss: layout.kerfLoss + trimKerf,
      scrap: trim + (remainderKept ? 0 : layout.remainder),
      cost: bin.cost,
    };
  });
  const totals = sumTotals(boards);
  const gapCost = Math.max(0, round6(totals.cost - bound.cost));
  const gapBoards = totals.boards - bound.boards;
  return {
    boards,
    unplaced,
    totals,
    lowerBound: bound,
    gap: { boards: gapBoards, cost: gapCost },
    provenOptimal: gapCost <= 1e-5 * Math.max(1, totals.cost),
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
    pieceLength += b.pieceLengths.reduce((s, l) => s + l, 0);
    cost += b.cost;
    kerfLoss += b.kerfLoss;
    scrap += b.scrap;
    if (b.remainderKept) {
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
