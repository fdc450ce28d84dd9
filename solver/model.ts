import { offcutCapacity, pieceWeight, stockCapacity } from './kerf';
import type { BoardSource, SolveInput, UnplacedPiece } from './types';

/** One distinct piece length; `ids` holds one id per piece still to place, in input order. */
export interface ItemType {
  length: number;
  weight: number;
  count: number;
  ids: string[];
}

/** One kind of board: a stock length (many boards) or an offcut (exactly one board). */
export interface BinType {
  source: BoardSource;
  id: string;
  length: number;
  capacity: number;
  cost: number;
  /** Boards of this kind that may be used; Infinity when unlimited. */
  limit: number;
}

export interface Model {
  kerf: number;
  trim: number;
  minOffcut: number;
  /** Sorted by weight, longest first. */
  items: ItemType[];
  bins: BinType[];
  /** Pieces that fit no source at all. */
  tooLong: UnplacedPiece[];
}

/** A default cost of the length in metres means that, without prices, least cost is least material. */
export function stockCost(length: number, cost: number | null | undefined): number {
  return cost ?? length / 1000;
}

export function buildModel(input: SolveInput): Model {
  const { kerf, trim } = input;
  const bins: BinType[] = [];
  for (const s of input.stock) {
    const limit = s.available ?? Infinity;
    const capacity = stockCapacity(s.length, trim, kerf);
    if (limit > 0 && capacity > kerf) {
      bins.push({
        source: 'stock',
        id: s.id,
        length: s.length,
        capacity,
        cost: stockCost(s.length, s.cost),
        limit,
      });
    }
  }
  for (const o of input.offcuts) {
    bins.push({
      source: 'offcut',
      id: o.id,
      length: o.length,
      capacity: offcutCapacity(o.length, kerf),
      cost: 0,
      limit: 1,
    });
  }
  const maxCapacity = bins.reduce((m, b) => Math.max(m, b.capacity), 0);
  const byLength = new Map<number, ItemType>();
  const tooLong: UnplacedPiece[] = [];
  for (const p of input.pieces) {
    const weight = pieceWeight(p.length, kerf);
    if (weight > maxCapacity) {
      for (let k = 0; k < p.quantity; k++)
        tooLong.push({ id: p.id, length: p.length, reason: 'longer-than-every-source' });
      continue;
    }
    let item = byLength.get(p.length);
    if (!item) {
      item = { length: p.length, weight, count: 0, ids: [] };
      byLength.set(p.length, item);
    }
    item.count += p.quantity;
    for (let k = 0; k < p.quantity; k++) item.ids.push(p.id);
  }
  const items = [...byLength.values()].sort((a, b) => b.weight - a.weight);
  return { kerf, trim, minOffcut: input.minOffcut, items, bins, tooLong };
}
