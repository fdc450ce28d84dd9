// Where each part of a board falls, in mm from its left end: trim, pieces, kerfs, remainder. Pure.
export type BoardInput = {
  lengthMm: number;
  trimMm: number;
  kerfMm: number;
  pieces: { lengthMm: number; label: string }[];
  remainderMm: number;
  keepRemainder: boolean;
};

export type BoardPart =
  | { kind: 'trim' | 'kerf' | 'kept' | 'scrap'; startMm: number; lengthMm: number }
  | { kind: 'piece'; startMm: number; lengthMm: number; label: string; index: number };

export function layOutBoard(board: BoardInput): BoardPart[] {
  const parts: BoardPart[] = [];
  let at = 0;
  if (board.trimMm > 0) {
    parts.push({ kind: 'trim', startMm: 0, lengthMm: board.trimMm });
    parts.push({ kind: 'kerf', startMm: board.trimMm, lengthMm: board.kerfMm });
    at = board.trimMm + board.kerfMm;
  }
  const remainderStart = board.lengthMm - board.remainderMm;
  board.pieces.forEach((piece, index) => {
    parts.push({ kind: 'piece', startMm: at, lengthMm: piece.lengthMm, label: piece.label, index });
    at += piece.lengthMm;
    // The last piece needs no kerf when it ends at the board's end.
    const kerf = Math.min(board.kerfMm, Math.max(0, board.lengthMm - at));
    if (kerf > 0) parts.push({ kind: 'kerf', startMm: at, lengthMm: kerf });
    at += kerf;
  });
  if (board.remainderMm > 0) {
    parts.push({
      kind: board.keepRemainder ? 'kept' : 'scrap',
      startMm: remainderStart,
      lengthMm: board.remainderMm,
    });
  }
  return parts;
}
