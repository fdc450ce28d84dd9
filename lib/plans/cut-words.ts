// How the plan page, cut sheets and the saw screen word nominal pieces and boards sold whole. Pure.

/** A board holding one piece that takes its whole length: no trim, no cut at the saw. */
export const FULL_LENGTH_WORDS = 'full length, no cut';

type CutPiece = { lengthMm: number; cutMm?: number };

/** The length the saw cuts: a nominal piece may be a few mm short of its listed length. */
export const actualCutMm = (piece: CutPiece) => piece.cutMm ?? piece.lengthMm;

/** True when the saw cuts the piece shorter than the cut list lists it. */
export const cutDiffers = (piece: CutPiece) => actualCutMm(piece) !== piece.lengthMm;

/** "2398 (listed 2400)" for a nominal piece cut short; the listed length alone otherwise. */
export function cutLengthText(piece: CutPiece, format: (mm: number) => string): string {
  return cutDiffers(piece)
    ? `${format(actualCutMm(piece))} (listed ${format(piece.lengthMm)})`
    : format(piece.lengthMm);
}

/** "2398–2399" (or "2398") over the lengths the saw cuts for one line. */
export function cutRange(cuts: number[], format: (mm: number) => string): string {
  const low = Math.min(...cuts);
  const high = Math.max(...cuts);
  return low === high ? format(low) : `${format(low)}–${format(high)}`;
}
