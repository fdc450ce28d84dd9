// Builds a stored plan (PlanSection list, PlanTotals, plan_boards rows) from solver runs, for the seeded history.
import { longestFirstBaseline } from '@/lib/plans/longest-first-baseline';
import { parsePieceId, parseSourceId, type BoardPiece, type PlanSection, type PlanTotals } from '@/lib/plans/plan-shapes';
import type { PlanBoard as SolvedBoard } from '@/solver';

export type BoardDraft = SolvedBoard & { sectionId: number; boardPieces: BoardPiece[] };

export function boardPiecesOf(board: SolvedBoard, kerf: number, labels: Map<number, string>): BoardPiece[] {
  let position = 0;
  return board.pieces.map((pieceId, k) => {
    const lengthMm = board.pieceLengths[k];
    position += (k > 0 ? kerf : 0) + lengthMm;
    const jobItemId = parsePieceId(pieceId);
    return { pieceId, jobItemId, label: labels.get(jobItemId) ?? '', lengthMm, markMm: board.marks[k] ?? position };
  });
}

/** Plan totals over every section; the baseline is the longest-first plan on new stock only. */
export function sumPlanTotals(sections: PlanSection[]): PlanTotals {
  const t: PlanTotals = {
    boards: 0, stockBoards: 0, offcutsUsed: 0, materialMm: 0, pieceMm: 0, kerfMm: 0, scrapMm: 0, keptMm: 0,
    keptOffcuts: 0, yieldPercent: 0, stockCostPence: 0, cuts: 0, lowerBoundBoards: 0, gapBoards: 0, unplacedPieces: 0,
    baseline: { boards: 0, stockCostPence: 0, scrapMm: 0 },
  };
  for (const { input, output } of sections) {
    const o = output.totals;
    t.boards += o.boards;
    t.stockBoards += o.stockBoards.reduce((n, s) => n + s.boards, 0);
    t.offcutsUsed += o.offcutsUsed;
    t.materialMm += o.materialLength;
    t.pieceMm += o.pieceLength;
    t.kerfMm += o.kerfLoss;
    t.scrapMm += o.scrap;
    t.keptMm += o.keptLength;
    t.keptOffcuts += o.keptOffcuts;
    t.stockCostPence += output.boards.filter((b) => b.source === 'stock').reduce((n, b) => n + b.cost, 0);
    t.cuts += output.boards.reduce((n, b) => n + b.pieces.length, 0);
    t.lowerBoundBoards += output.lowerBound.boards;
    t.gapBoards += output.gap.boards;
    t.unplacedPieces += output.unplaced.length;
    const baseline = longestFirstBaseline({ ...input, offcuts: [] });
    t.baseline.boards += baseline.boards;
    t.baseline.stockCostPence += Math.round(baseline.cost);
    t.baseline.scrapMm += baseline.scrap;
  }
  const used = t.materialMm - t.keptMm;
  t.yieldPercent = used > 0 ? Math.round((1000 * t.pieceMm) / used) / 10 : 0;
  t.stockCostPence = Math.round(t.stockCostPence);
  return t;
}

export const sourceOf = (board: SolvedBoard) => parseSourceId(board.sourceId);
