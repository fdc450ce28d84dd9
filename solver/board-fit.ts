// Which boards are cut without trim, and whether a set of pieces fits a board (DESIGN.md, full
// lengths and nominal pieces). Every packing the engine returns passes `boardFits`.

import type { BinType, Model } from './model';

/**
 * A board is left untrimmed when it holds only nominal pieces (factory ends are accepted), or one
 * piece that takes its whole length (sold full length, no cut).
 */
export function isOpenBoard(model: Model, bin: BinType, items: readonly number[]): boolean {
  if (items.every((i) => model.items[i].tolerance > 0)) return true;
  return items.length === 1 && bin.length <= model.items[items[0]].length;
}

export function boardCapacity(model: Model, binIndex: number, items: readonly number[]): number {
  const bin = model.bins[binIndex];
  return isOpenBoard(model, bin, items) ? bin.openCapacity : bin.capacity;
}

/** Pieces count at their shortest allowed length (length − tolerance), each with one kerf. */
export function boardFits(model: Model, binIndex: number, items: readonly number[]): boolean {
  let load = 0;
  for (const i of items) load += model.items[i].weight;
  return load <= boardCapacity(model, binIndex, items);
}

/** The board is one piece sold at the stock length: no cut, no trim, no kerf. */
export function isFullLength(model: Model, bin: BinType, items: readonly number[]): boolean {
  return items.length === 1 && bin.length <= model.items[items[0]].length;
}
