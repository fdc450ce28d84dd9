import {
  addFractions,
  readDecimal,
  roundFraction,
  scaleFraction,
  ZERO,
  type Fraction,
} from './exact-fraction';
import { INCHES_PER_FOOT, TENTHS_OF_MM_PER_INCH } from './length-constants';

// Feet then inches, either part optional: 7' 8 5/8", 7'-8 5/8", 7ft 8in, 8', 8ft, 92-5/8", 92 5/8",
// 3/4", 4'-0", 8.5'. Inches may be whole, decimal, a fraction, or whole plus fraction.
const FEET = /^(\d*\.?\d+) ?(?:'|ft|feet|foot)(?: ?- ?| )?/;
const INCH_MARK = / ?(?:"|in|inch|inches)$/;
const INCHES_MIXED = /^(\d+)(?: | ?- ?)(\d+)\/(\d+)$/;
const INCHES_FRACTION = /^(\d+)\/(\d+)$/;
const INCHES_DECIMAL = /^\d*\.?\d+$/;

export type ImperialParse =
  { kind: 'mm'; mm: bigint } | { kind: 'error'; message: string } | { kind: 'no-match' };

function readInches(text: string): Fraction | string | null {
  const mixed = INCHES_MIXED.exec(text);
  const fraction = mixed ? null : INCHES_FRACTION.exec(text);
  if (mixed || fraction) {
    const whole = mixed ? BigInt(mixed[1]) : 0n;
    const num = BigInt(mixed ? mixed[2] : fraction![1]);
    const den = BigInt(mixed ? mixed[3] : fraction![2]);
    if (den === 0n) return 'A fraction cannot have 0 below the line.';
    if (mixed && num >= den) return `Write the fraction ${num}/${den} as less than one, e.g. 8 5/8".`;
    return addFractions({ num: whole, den: 1n }, { num, den });
  }
  return INCHES_DECIMAL.test(text) ? readDecimal(text) : null;
}

/** Reads a feet-inches length; inches without a foot part need an inch mark unless written as a fraction. */
export function parseImperial(text: string): ImperialParse {
  const feetMatch = FEET.exec(text);
  let rest = feetMatch ? text.slice(feetMatch[0].length) : text;
  const hasInchMark = INCH_MARK.test(rest);
  rest = rest.replace(INCH_MARK, '').trim();
  if (!feetMatch && !hasInchMark && !rest.includes('/')) return { kind: 'no-match' };
  if (!feetMatch && rest === '') return { kind: 'no-match' };

  let inches: Fraction = ZERO;
  if (rest !== '') {
    const read = readInches(rest);
    if (read === null) return { kind: 'no-match' };
    if (typeof read === 'string') return { kind: 'error', message: read };
    inches = read;
  }
  const feet = feetMatch ? readDecimal(feetMatch[1]) : ZERO;
  if (!feet) return { kind: 'no-match' };
  const totalInches = addFractions(scaleFraction(feet, INCHES_PER_FOOT), inches);
  return { kind: 'mm', mm: roundFraction(scaleFraction(totalInches, TENTHS_OF_MM_PER_INCH, 10n)) };
}
