// Sequential fill: take the longest piece left, and for every board kind that can still take it
// find the fullest board around it by subset-sum (minimum slack). Keep the board with the lowest
// cost per millimetre filled (offcuts cost nothing, so they go first), least scrap on ties.
// Variants of the piece order give the local search different starting points.

import type { Model } from './model';
import { boardScrap, makeBoard, type Packing } from './packing';
import { buildSubsetTable, recoverSubset } from './subset-fill';

export function sequentialFill(model: Model, demand: number[], binsLeft: number[]): Packing {
  const weights = model.items.map((it) => it.weight);
  const counts = [...demand];
  const left = [...binsLeft];
  const packing: Packing = { boards: [], unplaced: new Array<number>(counts.length).fill(0) };
  for (;;) {
    const first = counts.findIndex((c) => c > 0);
    if (first < 0) break;
    const w = weights[first];
    const candidates: number[] = [];
    let maxCap = 0;
    model.bins.forEach((b, j) => {
      if (left[j] > 0 && b.capacity >= w) {
        candidates.push(j);
        maxCap = Math.max(maxCap, b.capacity);
      }
    });
    counts[first]--;
    if (candidates.length === 0) {
      packing.unplaced[first]++;
      continue;
    }
    const table = buildSubsetTable(weights, counts, maxCap - w);
    let pick = -1;
    let pickScore = Infinity;
    let pickScrap = Infinity;
    let pickLoad = 0;
    for (const j of candidates) {
      const bin = model.bins[j];
      const load = w + table.best[bin.capacity - w];
      const score = bin.cost / load;
      const scrap = boardScrap(model, { bin: j, items: [], load });
      if (
        score < pickScore - 1e-12 ||
        (Math.abs(score - pickScore) <= 1e-12 &&
          (scrap < pickScrap || (scrap === pickScrap && load > pickLoad)))
      ) {
        pick = j;
        pickScore = score;
        pickScrap = scrap;
        pickLoad = load;
      }
    }
    const rest = recoverSubset(table, weights, pickLoad - w, counts.length);
    const items = [first];
    rest.forEach((c, i) => {
      counts[i] -= c;
      for (let k = 0; k < c; k++) items.push(i);
    });
    left[pick]--;
    packing.boards.push(makeBoard(model, pick, items));
  }
  return packing;
}

/** First-fit decreasing on the cheapest board per millimetre: the simple baseline. */
export function firstFitDecreasing(model: Model, demand: number[], binsLeft: number[]): Packing {
  const left = [...binsLeft];
  const order = model.bins
    .map((_, j) => j)
    .sort((a, b) => ratio(model, a) - ratio(model, b) || model.bins[b].capacity - model.bins[a].capacity);
  const open: { bin: number; items: number[]; load: number }[] = [];
  const packing: Packing = { boards: [], unplaced: new Array<number>(demand.length).fill(0) };
  demand.forEach((count, i) => {
    const w = model.items[i].weight;
    for (let k = 0; k < count; k++) {
      const board = open.find((b) => model.bins[b.bin].capacity - b.load >= w);
      if (board) {
        board.items.push(i);
        board.load += w;
        continue;
      }
      const j = order.find((jj) => left[jj] > 0 && model.bins[jj].capacity >= w);
      if (j === undefined) {
        packing.unplaced[i]++;
        continue;
      }
      left[j]--;
      open.push({ bin: j, items: [i], load: w });
    }
  });
  packing.boards = open.map((b) => makeBoard(model, b.bin, b.items));
  return packing;
}

function ratio(model: Model, j: number): number {
  return model.bins[j].cost / model.bins[j].capacity;
}
