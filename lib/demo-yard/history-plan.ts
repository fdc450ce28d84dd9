// Helpers for the seeded history's plan_boards rows, from solver runs.
import { parsePieceId, parseSourceId, type BoardPiece } from '@/lib/plans/plan-shapes';
import type { PlanBoard as SolvedBoard } from '@/solver';

export type BoardDraft = SolvedBoard & { sectionId: number; boardPieces: BoardPiece[] };

export function boardPiecesOf(board: SolvedBoard, kerf: number, labels: Map<number, string>): BoardPiece[] {
  let position = 0;
  return board.pieces.map((pieceId, k) => {
    const lengthMm = board.pieceLengths[k];
    position += (k > 0 ? kerf : 0) + lengthMm;
    const jobItemId = parsePieceId(pieceId);
    return {
      pieceId,
      jobItemId,
      label: labels.get(jobItemId) ?? '',
      lengthMm,
      markMm: board.marks[k] ?? position,
    };
  });
}

export const sourceOf = (board: SolvedBoard) => parseSourceId(board.sourceId);
