// Money in the engine is compared in whole thousandths of the price unit (a tenth of a penny for
// prices in pounds; a millimetre for the default price of a metre), so no relative slack is needed.

export const UNITS_PER_PRICE = 1000;

export function toUnits(cost: number): number {
  return Math.round(cost * UNITS_PER_PRICE);
}

export function fromUnits(units: number): number {
  return units / UNITS_PER_PRICE;
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/** Every plan's cost is a whole combination of board prices, so a bound rounds up to their common step. */
export function costStep(unitsPerBoard: number[]): number {
  return unitsPerBoard.filter((u) => u > 0).reduce(gcd, 0) || 1;
}

/**
 * A fractional bound (in price units, as an LP gives it) rounded up to the next cost a plan can have.
 * The small slack absorbs floating-point error in the LP value before rounding.
 */
export function roundBoundUp(value: number, step: number): number {
  if (value <= 0) return 0;
  const units = value * UNITS_PER_PRICE;
  const safe = Math.ceil(units - 1e-6 * Math.max(1, units));
  return Math.ceil(safe / step) * step;
}
