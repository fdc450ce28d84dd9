// Exact non-negative fractions over BigInt, so unit conversions never pick up floating-point error
// before the one final rounding to whole millimetres.

export type Fraction = { num: bigint; den: bigint };

export const ZERO: Fraction = { num: 0n, den: 1n };

/** Reads plain decimal digits such as "2", "2.4" or ".5" exactly; returns null for anything else. */
export function readDecimal(text: string): Fraction | null {
  const match = /^(\d*)(?:\.(\d+))?$/.exec(text);
  if (!match || (match[1] === '' && match[2] === undefined)) return null;
  const whole = match[1] === '' ? '0' : match[1];
  const decimals = match[2] ?? '';
  return { num: BigInt(whole + decimals), den: 10n ** BigInt(decimals.length) };
}

export function addFractions(a: Fraction, b: Fraction): Fraction {
  return { num: a.num * b.den + b.num * a.den, den: a.den * b.den };
}

export function scaleFraction(a: Fraction, times: bigint, divide: bigint = 1n): Fraction {
  return { num: a.num * times, den: a.den * divide };
}

/** Nearest whole number, halves rounded up (all values here are non-negative). */
export function roundFraction(a: Fraction): bigint {
  return (2n * a.num + a.den) / (2n * a.den);
}
