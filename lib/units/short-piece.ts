import { formatMillimetres } from './format-length';
import { parseLength } from './parse-length';

/** Longest metres reading worth suggesting for a bare number (a 12 m length is already rare). */
const LONGEST_SUGGESTION_MM = 12_000;

const BARE_NUMBER = /^\s*\d*\.?\d+\s*$/;

/**
 * Why a piece is too short to cut, or null when it is long enough. A bare number with no unit is
 * millimetres; when that reading is absurdly short and the same figure in metres is a sensible
 * length, ask rather than guess: "did you mean 2.4 m (2400 mm)?".
 */
export function shortPieceMessage({
  mm,
  minSafeMm,
  typed,
}: {
  mm: number;
  minSafeMm: number;
  /** What the person typed, when the length came from text. */
  typed?: string | null;
}): string | null {
  if (mm >= minSafeMm) return null;
  if (typed && BARE_NUMBER.test(typed)) {
    const asMetres = parseLength(`${typed.trim()} m`);
    if (asMetres.ok && asMetres.mm >= minSafeMm && asMetres.mm <= LONGEST_SUGGESTION_MM)
      return `"${typed.trim()}" has no unit, so it reads as ${formatMillimetres(mm)} mm. Did you mean ${typed.trim()} m (${formatMillimetres(asMetres.mm)} mm)? Write the unit to be sure.`;
  }
  return `${formatMillimetres(mm)} mm is shorter than the yard's minimum safe piece length (${formatMillimetres(minSafeMm)} mm): a piece that short cannot be held safely at the saw.`;
}
