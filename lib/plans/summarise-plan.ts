// Whole-plan figures and the saw's board list, from the solver's per-section results. Pure.
import type { PlanBoard } from '@/solver';
import { longestFirstBaseline } from './longest-first-baseline';
import {
  parsePieceId,
  parseSourceId,
  type BoardPiece,
  type PieceDetails,
  type PlanSection,
  type PlanTotals,
} from './plan-shapes';

export type BoardRow = {
  boardNo: number;
  sectionId: number;
  source: 'stock' | 'offcut';
  stockLengthId: number | null;
  offcutId: number | null;
  lengthMm: number;
  trimMm: number;
  pieces: BoardPiece[];
  remainderMm: number;
  keepRemainder: boolean;
  /** One piece sold at the whole stock length: no trim, no cut. */
  fullLength: boolean;
};

/** Cuts the saw makes on a board: one per piece, none for a board sold full length. */
export const sawCuts = (board: Pick<PlanBoard, 'pieces' | 'fullLength'>) =>
  board.fullLength ? 0 : board.pieces.length;

export function summarisePlan(sections: PlanSection[]): PlanTotals {
  const t: PlanTotals = {
    boards: 0,
    stockBoards: 0,
    offcutsUsed: 0,
    materialMm: 0,
    pieceMm: 0,
    kerfLossMm: 0,
    scrapMm: 0,
    keptMm: 0,
    keptOffcuts: 0,
    yieldPercent: 0,
    stockCostPence: 0,
    cuts: 0,
    lowerBoundBoards: 0,
    gapBoards: 0,
    lowerBoundPence: 0,
    unplacedPieces: 0,
    baseline: { boards: 0, stockCostPence: 0, scrapMm: 0 },
  };
  for (const { input, output } of sections) {
    const o = output.totals;
    t.boards += o.boards;
    t.offcutsUsed += o.offcutsUsed;
    t.stockBoards += o.boards - o.offcutsUsed;
    t.materialMm += o.materialLength;
    t.pieceMm += o.pieceLength;
    t.kerfLossMm += o.kerfLoss;
    t.scrapMm += o.scrap;
    t.keptMm += o.keptLength;
    t.keptOffcuts += o.keptOffcuts;
    t.stockCostPence += Math.round(
      output.boards.filter((b) => b.source === 'stock').reduce((sum, b) => sum + b.cost, 0) * 100,
    );
    t.cuts += output.boards.reduce((sum, b) => sum + sawCuts(b), 0);
    t.lowerBoundBoards += output.lowerBound.boards;
    t.lowerBoundPence! += boundPence(output.lowerBound);
    t.gapBoards += output.gap.boards;
    t.unplacedPieces += output.unplaced.length;
    const base = longestFirstBaseline(input);
    t.baseline.boards += base.boards;
    t.baseline.stockCostPence += Math.round(base.cost * 100);
    t.baseline.scrapMm += base.scrap;
  }
  const consumed = t.materialMm - t.keptMm;
  t.yieldPercent = consumed > 0 ? Math.round((1000 * t.pieceMm) / consumed) / 10 : 0;
  return t;
}

/**
 * The solver's cost bound in whole pence. Plans cost whole pence, so a bound of £12.341 means no
 * plan under £12.35: round up. Reads a pence figure when the solver gives one.
 */
function boundPence(bound: { cost: number } & { costPence?: unknown }): number {
  if (typeof bound.costPence === 'number') return Math.ceil(bound.costPence);
  return Math.ceil(Math.round(bound.cost * 1e6) / 1e4);
}

/** The boards in saw order: section by section, offcuts first, then the longest boards. */
export function planBoardRows(
  sections: PlanSection[],
  labels: Map<number, string | PieceDetails>,
): BoardRow[] {
  const rows: BoardRow[] = [];
  for (const { sectionId, input, output } of sections) {
    const boards = [...output.boards].sort(
      (a, b) => Number(a.source === 'stock') - Number(b.source === 'stock') || b.length - a.length,
    );
    for (const board of boards) {
      const source = parseSourceId(board.sourceId);
      rows.push({
        boardNo: rows.length + 1,
        sectionId,
        source: board.source,
        stockLengthId: source.kind === 'stock' ? source.id : null,
        offcutId: source.kind === 'offcut' ? source.id : null,
        lengthMm: board.length,
        trimMm: board.trim,
        pieces: boardPieces(board, input, labels),
        remainderMm: board.remainder,
        keepRemainder: board.keepRemainder,
        fullLength: board.fullLength ?? false,
      });
    }
  }
  return rows;
}

/** The last piece may end exactly at the board's end, where no cut (and so no mark) is needed. */
function boardPieces(
  board: Pick<PlanBoard, 'pieces' | 'pieceLengths' | 'cutLengths' | 'marks'>,
  input: Pick<PlanSection['input'], 'kerf' | 'pieces'>,
  labels: Map<number, string | PieceDetails>,
): BoardPiece[] {
  const kerf = input.kerf;
  const tolerance = new Map(input.pieces.map((p) => [p.id, p.tolerance ?? 0]));
  // Plans stored before nominal pieces carry no cut lengths: the ordered lengths were cut.
  const cuts = board.cutLengths ?? board.pieceLengths;
  let start = 0;
  return board.pieces.map((pieceId, i) => {
    const jobItemId = parsePieceId(pieceId);
    const markMm = board.marks[i] ?? start + cuts[i];
    start = markMm + kerf;
    const found = labels.get(jobItemId) ?? '';
    const details: PieceDetails = typeof found === 'string' ? { label: found } : found;
    return {
      pieceId,
      jobItemId,
      label: details.label,
      lengthMm: board.pieceLengths[i],
      cutMm: cuts[i],
      ...(tolerance.get(pieceId) ? { toleranceMm: tolerance.get(pieceId) } : {}),
      markMm,
      ...(details.angleTenths ? { angleTenths: details.angleTenths, cutNote: details.note ?? '' } : {}),
      ...(details.marks ? { marks: details.marks } : {}),
    };
  });
}
