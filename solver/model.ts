import { offcutCapacity, pieceWeight, stockCapacity } from './kerf';
import { toUnits } from './money';
import type { BoardSource, SolveInput, UnplacedPiece } from './types';

/** One distinct piece length and tolerance; `ids` holds one id per piece to place, in input order. */
export interface ItemType {
  length: number;
  /** Millimetres the piece may be delivered short; 0 = exact. */
  tolerance: number;
  /** Shortest allowed length plus one kerf: what the piece takes from a board at least. */
  weight: number;
  /** Full length plus one kerf. */
  fullWeight: number;
  count: number;
  ids: string[];
}

/** One kind of board: a stock length (many boards) or an offcut (exactly one board). */
export interface BinType {
  source: BoardSource;
  id: string;
  length: number;
  /** usable + kerf for a trimmed board. */
  capacity: number;
  /** length + kerf: an untrimmed board (only nominal pieces, or one full-length piece). */
  openCapacity: number;
  cost: number;
  /** `cost` in whole money units (see money.ts). */
  costUnits: number;
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
  /**
   * Some board may be untrimmed (nominal pieces, or a piece as long as a stock length), so bounds
   * must use the untrimmed capacity to stay valid.
   */
  relaxed: boolean;
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
    if (limit > 0) {
      const cost = stockCost(s.length, s.cost);
      bins.push({
        source: 'stock',
        id: s.id,
        length: s.length,
        capacity: Math.max(0, capacity),
        openCapacity: s.length + kerf,
        cost,
        costUnits: toUnits(cost),
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
      openCapacity: offcutCapacity(o.length, kerf),
      cost: 0,
      costUnits: 0,
      limit: 1,
    });
  }
  const byLength = new Map<string, ItemType>();
  const tooLong: UnplacedPiece[] = [];
  for (const p of input.pieces) {
    const tolerance = Math.min(p.tolerance ?? 0, p.length - 1);
    const weight = pieceWeight(p.length - tolerance, kerf);
    const fits = bins.some(
      (b) => weight <= (tolerance > 0 || b.length <= p.length ? b.openCapacity : b.capacity),
    );
    if (!fits) {
      for (let k = 0; k < p.quantity; k++)
        tooLong.push({ id: p.id, length: p.length, reason: 'longer-than-every-source' });
      continue;
    }
    const key = `${p.length}/${tolerance}`;
    let item = byLength.get(key);
    if (!item) {
      item = {
        length: p.length,
        tolerance,
        weight,
        fullWeight: pieceWeight(p.length, kerf),
        count: 0,
        ids: [],
      };
      byLength.set(key, item);
    }
    item.count += p.quantity;
    for (let k = 0; k < p.quantity; k++) item.ids.push(p.id);
  }
  const items = [...byLength.values()].sort(
    (a, b) => b.weight - a.weight || b.length - a.length || a.tolerance - b.tolerance,
  );
  // Only a piece that could be sold at a stock length (length − tolerance ≤ stock ≤ length) skips the
  // trim; a piece longer than a stock length never fits that stock, so it relaxes nothing.
  const relaxed =
    trim > 0 &&
    items.some(
      (it) =>
        it.tolerance > 0 ||
        bins.some(
          (b) => b.source === 'stock' && b.length <= it.length && it.length - it.tolerance <= b.length,
        ),
    );
  return { kerf, trim, minOffcut: input.minOffcut, items, bins, tooLong, relaxed };
}
