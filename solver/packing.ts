// The engine's working form of a plan: boards as item-type counts, before ids and marks are assigned.

import { boardCapacity, isOpenBoard } from './board-fit';
import type { Model } from './model';

export interface PackedBoard {
  bin: number;
  /** Item type indexes, one per piece, longest first. */
  items: number[];
  /** Σ weight: pieces at their shortest allowed length, each with one kerf. */
  load: number;
}

export interface Packing {
  boards: PackedBoard[];
  /** Pieces per item type that found no board (not enough stock). */
  unplaced: number[];
}

export interface PackingScore {
  unplaced: number;
  /** Whole money units (money.ts), compared exactly. */
  cost: number;
  scrap: number;
  offcutsUsed: number;
  keptCount: number;
}

/** Left after cutting every piece at its full length where the board allows. */
export function remainderOf(model: Model, board: PackedBoard): number {
  let fullLoad = 0;
  for (const i of board.items) fullLoad += model.items[i].fullWeight;
  const leftover = boardCapacity(model, board.bin, board.items) - fullLoad;
  return Math.max(0, leftover - model.kerf);
}

export function isKept(model: Model, remainder: number): boolean {
  return remainder > 0 && remainder >= model.minOffcut;
}

export function boardScrap(model: Model, board: PackedBoard): number {
  const bin = model.bins[board.bin];
  const rem = remainderOf(model, board);
  const trimmed = bin.source === 'stock' && !isOpenBoard(model, bin, board.items);
  return (trimmed ? model.trim : 0) + (isKept(model, rem) ? 0 : rem);
}

export function scorePacking(model: Model, packing: Packing): PackingScore {
  let cost = 0;
  let scrap = 0;
  let offcutsUsed = 0;
  let keptCount = 0;
  for (const b of packing.boards) {
    const bin = model.bins[b.bin];
    cost += bin.costUnits;
    scrap += boardScrap(model, b);
    if (bin.source === 'offcut') offcutsUsed++;
    if (isKept(model, remainderOf(model, b))) keptCount++;
  }
  const unplaced = packing.unplaced.reduce((s, n) => s + n, 0);
  return { unplaced, cost, scrap, offcutsUsed, keptCount };
}

/** Negative when `a` is the better plan: objective keys in the order the contract sets. */
export function compareScores(a: PackingScore, b: PackingScore): number {
  if (a.unplaced !== b.unplaced) return a.unplaced - b.unplaced;
  if (a.cost !== b.cost) return a.cost - b.cost;
  if (a.scrap !== b.scrap) return a.scrap - b.scrap;
  if (a.offcutsUsed !== b.offcutsUsed) return b.offcutsUsed - a.offcutsUsed;
  return a.keptCount - b.keptCount;
}

export function makeBoard(model: Model, bin: number, items: number[]): PackedBoard {
  const sorted = [...items].sort((x, y) => x - y);
  return { bin, items: sorted, load: sorted.reduce((s, i) => s + model.items[i].weight, 0) };
}
