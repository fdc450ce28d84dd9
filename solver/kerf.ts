// Kerf and trim arithmetic. Internally every piece weighs (length + kerf) and every board holds
// (usable + kerf), so the rule Σ(piece + kerf) ≤ usable + kerf becomes plain bin packing.

export function usableLength(length: number, trim: number, kerf: number): number {
  return length - trim - (trim > 0 ? kerf : 0);
}

export function pieceWeight(length: number, kerf: number): number {
  return length + kerf;
}

export function stockCapacity(length: number, trim: number, kerf: number): number {
  return usableLength(length, trim, kerf) + kerf;
}

/** Offcuts were squared when they were cut, so they are never trimmed. */
export function offcutCapacity(length: number, kerf: number): number {
  return length + kerf;
}

export interface BoardLayout {
  marks: number[];
  remainder: number;
  kerfLoss: number;
}

/**
 * Lays pieces out from the board's start (after the trim). Each piece is followed by a cut;
 * the last cut is skipped when the last piece ends exactly at the usable end, and a cut that
 * runs off the end eats only what is left.
 */
export function layOutBoard(usable: number, pieceLengths: number[], kerf: number): BoardLayout {
  const marks: number[] = [];
  let pos = 0;
  let kerfLoss = 0;
  for (const len of pieceLengths) {
    pos += len;
    const left = usable - pos;
    if (left <= 0) break;
    marks.push(pos);
    const cut = Math.min(kerf, left);
    kerfLoss += cut;
    pos += cut;
  }
  return { marks, remainder: Math.max(0, usable - pos), kerfLoss };
}
