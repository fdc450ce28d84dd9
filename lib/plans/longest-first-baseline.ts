// The plan a yard gets without Kerfwise: pieces longest first, each into the first open board it
// fits, a new board of the longest stock length whenever none fits, and no rack offcuts.
// Reports compare every Kerfwise plan with this one.
import type { SolveInput } from '@/solver';

export type BaselineResult = { boards: number; cost: number; scrap: number };

export function longestFirstBaseline(input: SolveInput): BaselineResult {
  const { kerf, trim } = input;
  const stock = [...input.stock].sort((a, b) => b.length - a.length);
  const used = new Map<string, number>();
  const usable = (length: number) => length - trim - (trim > 0 ? kerf : 0);
  const pieces = input.pieces
    .flatMap((p) => Array.from({ length: p.quantity }, () => p.length))
    .sort((a, b) => b - a);
  // Each open board keeps its free room, counted with one kerf of credit at the far end.
  const boards: { free: number; length: number; cost: number }[] = [];
  for (const piece of pieces) {
    const open = boards.find((b) => b.free >= piece + kerf);
    if (open) {
      open.free -= piece + kerf;
      continue;
    }
    const choice = stock.find(
      (s) => usable(s.length) + kerf >= piece + kerf && (s.available == null || (used.get(s.id) ?? 0) < s.available),
    );
    if (!choice) continue; // not placeable in new stock: left out of the comparison
    used.set(choice.id, (used.get(choice.id) ?? 0) + 1);
    boards.push({
      free: usable(choice.length) + kerf - piece - kerf,
      length: choice.length,
      cost: choice.cost ?? choice.length / 1000,
    });
  }
  const pieceTotal = pieces.reduce((sum, p) => sum + p, 0);
  const material = boards.reduce((sum, b) => sum + b.length, 0);
  return {
    boards: boards.length,
    cost: Math.round(boards.reduce((sum, b) => sum + b.cost, 0) * 100) / 100,
    scrap: material - pieceTotal,
  };
}
