// The plan a yard gets without an optimiser: pieces longest first, each into the first open board
// it fits, a new board of the longest stock length when none fits; then each board is swapped for
// the cheapest stock length that still holds its pieces. New stock only (no offcuts).
// Reports compare Kerfwise's plans with this one to show what the optimiser saved.
import type { SolveInput } from '@/solver';

export type BaselineResult = {
  boards: number;
  /** Same units as the input's stock costs (a missing cost counts as the length in metres). */
  cost: number;
  /** Trim plus remainders shorter than the minimum kept offcut, in mm. */
  scrap: number;
};

type Stock = { length: number; cost: number; left: number; capacity: number };
type Board = { source: Stock; load: number; pieceMm: number; count: number };

export function longestFirstBaseline(input: SolveInput): BaselineResult {
  const { kerf, trim, minOffcut } = input;
  const usableOf = (length: number) => length - trim - (trim > 0 ? kerf : 0);
  // Every piece weighs length + kerf and a board holds usable + kerf (the solver's kerf rule).
  const stock: Stock[] = input.stock
    .map((s) => ({
      length: s.length,
      cost: s.cost ?? s.length / 1000,
      left: s.available ?? Infinity,
      capacity: usableOf(s.length) + kerf,
    }))
    .sort((a, b) => b.length - a.length);
  const pieces = input.pieces
    .flatMap((p) => Array.from({ length: p.quantity }, () => p.length))
    .sort((a, b) => b - a);

  const boards: Board[] = [];
  for (const length of pieces) {
    const weight = length + kerf;
    const board = boards.find((b) => b.load + weight <= b.source.capacity);
    if (board) {
      board.load += weight;
      board.pieceMm += length;
      board.count++;
      continue;
    }
    const source = stock.find((s) => s.left > 0 && s.capacity >= weight);
    if (!source) continue; // the planner lists such pieces as unplaced; the baseline skips them too
    source.left--;
    boards.push({ source, load: weight, pieceMm: length, count: 1 });
  }

  let cost = 0;
  let scrap = 0;
  for (const board of boards) {
    board.source.left++;
    const chosen = stock
      .filter((s) => s.left > 0 && s.capacity >= board.load)
      .reduce((best, s) =>
        s.cost < best.cost || (s.cost === best.cost && s.length < best.length) ? s : best,
      );
    chosen.left--;
    cost += chosen.cost;
    // Cut pieces from one end: each is followed by a kerf unless it ends at (or the kerf runs off) the end.
    const afterPieces = usableOf(chosen.length) - board.pieceMm - (board.count - 1) * kerf;
    const remainder = Math.max(0, afterPieces - kerf);
    const kept = remainder > 0 && remainder >= minOffcut;
    scrap += trim + (kept ? 0 : remainder);
  }
  return { boards: boards.length, cost: Math.round(cost * 1e6) / 1e6, scrap };
}
