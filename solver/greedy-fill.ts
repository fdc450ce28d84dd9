// Sequential fill: take the longest piece left, and for every board kind that can still take it
// find the fullest board around it by subset-sum (minimum slack). Keep the board with the lowest
// cost per millimetre filled (offcuts cost nothing, so they go first), least scrap on ties.
// Variants of the piece order give the local search different starting points.

import { boardFits } from './board-fit';
import type { Model } from './model';
import { isKept, makeBoard, type Packing } from './packing';
import { buildSubsetTable, recoverSubset } from './subset-fill';

export function sequentialFill(model: Model, demand: number[], binsLeft: number[]): Packing {
  const weights = model.items.map((it) => it.weight);
  const nominal = model.items.map((it) => it.tolerance > 0);
  const counts = [...demand];
  const left = [...binsLeft];
  const packing: Packing = { boards: [], unplaced: new Array<number>(counts.length).fill(0) };
  for (;;) {
    const first = counts.findIndex((c) => c > 0);
    if (first < 0) break;
    const w = weights[first];
    counts[first]--;
    // Each board kind offers up to two boards around this piece: trimmed, holding any pieces, and
    // untrimmed, holding only nominal pieces (or this piece alone at the stock's full length).
    const options: { bin: number; open: boolean; cap: number }[] = [];
    model.bins.forEach((b, j) => {
      if (left[j] <= 0) return;
      if (b.capacity >= w) options.push({ bin: j, open: false, cap: b.capacity });
      const fullLength = b.length <= model.items[first].length;
      if ((nominal[first] || fullLength) && b.openCapacity >= w && b.openCapacity > b.capacity)
        options.push({ bin: j, open: true, cap: nominal[first] ? b.openCapacity : w });
    });
    if (options.length === 0) {
      packing.unplaced[first]++;
      continue;
    }
    const maxCap = (open: boolean) => options.reduce((m, o) => (o.open === open ? Math.max(m, o.cap) : m), w);
    const tables = {
      trimmed: buildSubsetTable(weights, counts, maxCap(false) - w),
      open: buildSubsetTable(
        weights,
        counts.map((c, i) => (nominal[i] ? c : 0)),
        maxCap(true) - w,
      ),
    };
    let pick: (typeof options)[number] | null = null;
    let pickScore = Infinity;
    let pickScrap = Infinity;
    let pickLoad = 0;
    for (const o of options) {
      const bin = model.bins[o.bin];
      const table = o.open ? tables.open : tables.trimmed;
      const load = w + table.best[o.cap - w];
      const score = bin.cost / load;
      const room = (o.open ? bin.openCapacity : bin.capacity) - load - model.kerf;
      const rest = Math.max(0, room);
      const scrap = (o.open || bin.source === 'offcut' ? 0 : model.trim) + (isKept(model, rest) ? 0 : rest);
      if (
        score < pickScore - 1e-12 ||
        (Math.abs(score - pickScore) <= 1e-12 &&
          (scrap < pickScrap || (scrap === pickScrap && load > pickLoad)))
      ) {
        pick = o;
        pickScore = score;
        pickScrap = scrap;
        pickLoad = load;
      }
    }
    const chosen = pick!;
    const table = chosen.open ? tables.open : tables.trimmed;
    const rest = recoverSubset(table, weights, pickLoad - w, counts.length);
    const items = [first];
    rest.forEach((c, i) => {
      counts[i] -= c;
      for (let k = 0; k < c; k++) items.push(i);
    });
    left[chosen.bin]--;
    packing.boards.push(makeBoard(model, chosen.bin, items));
  }
  return packing;
}

/** First-fit decreasing on the cheapest board per millimetre: the simple baseline. */
export function firstFitDecreasing(model: Model, demand: number[], binsLeft: number[]): Packing {
  const order = model.bins
    .map((_, j) => j)
    .sort((a, b) => ratio(model, a) - ratio(model, b) || model.bins[b].capacity - model.bins[a].capacity);
  return firstFitInOrder(model, demand, binsLeft, order);
}

/** Longest-first as a yard does it by hand: shortest fitting offcut first, else the longest stock length. */
export function longestFirst(
  model: Model,
  demand: number[],
  binsLeft: number[],
  { offcuts = true }: { offcuts?: boolean } = {},
): Packing {
  const order = model.bins
    .map((_, j) => j)
    .filter((j) => offcuts || model.bins[j].source !== 'offcut')
    .sort((a, b) => {
      const ba = model.bins[a];
      const bb = model.bins[b];
      if (ba.source !== bb.source) return ba.source === 'offcut' ? -1 : 1;
      return ba.source === 'offcut' ? ba.length - bb.length : bb.length - ba.length;
    });
  return firstFitInOrder(model, demand, binsLeft, order);
}

function firstFitInOrder(model: Model, demand: number[], binsLeft: number[], order: number[]): Packing {
  const left = [...binsLeft];
  const open: { bin: number; items: number[]; load: number; nominal: boolean }[] = [];
  const packing: Packing = { boards: [], unplaced: new Array<number>(demand.length).fill(0) };
  demand.forEach((count, i) => {
    const item = model.items[i];
    const nominal = item.tolerance > 0;
    for (let k = 0; k < count; k++) {
      // A second piece ends any full-length board, so a board of two or more pieces is untrimmed
      // only when every piece is nominal (the rule of boardFits, without building item lists).
      const board = open.find((b) => {
        const bin = model.bins[b.bin];
        const cap = b.nominal && nominal ? bin.openCapacity : bin.capacity;
        return b.load + item.weight <= cap;
      });
      if (board) {
        board.items.push(i);
        board.load += item.weight;
        board.nominal &&= nominal;
        continue;
      }
      const j = order.find((jj) => left[jj] > 0 && boardFits(model, jj, [i]));
      if (j === undefined) {
        packing.unplaced[i]++;
        continue;
      }
      left[j]--;
      open.push({ bin: j, items: [i], load: item.weight, nominal });
    }
  });
  packing.boards = open.map((b) => makeBoard(model, b.bin, b.items));
  return packing;
}

function ratio(model: Model, j: number): number {
  return model.bins[j].cost / model.bins[j].capacity;
}
