// Where each part of a board falls, in mm from its left end: trim, pieces, kerfs, remainder. Pure.
export type BoardInput = {
  lengthMm: number;
  trimMm: number;
  kerfMm: number;
  /** cutMm: the length actually cut (a nominal piece may be short of its listed lengthMm). */
  pieces: { lengthMm: number; cutMm?: number; label: string }[];
  remainderMm: number;
  keepRemainder: boolean;
};

export type BoardPart =
  | { kind: 'trim' | 'kerf' | 'kept' | 'scrap'; startMm: number; lengthMm: number }
  | { kind: 'piece'; startMm: number; lengthMm: number; listedMm: number; label: string; index: number };

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
    const cut = piece.cutMm ?? piece.lengthMm;
    parts.push({
      kind: 'piece',
      startMm: at,
      lengthMm: cut,
      listedMm: piece.lengthMm,
      label: piece.label,
      index,
    });
    at += cut;
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
