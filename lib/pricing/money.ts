// Amounts in pounds (a solver's board cost, a typed price) become whole pence once, here.

/** Pounds to whole pence, halves rounded up; "1.005" is treated as written, not as 1.00499…. */
export function toPence(pounds: number): number {
  if (!Number.isFinite(pounds)) throw new RangeError(`Not an amount of money: ${pounds}`);
  const text = String(pounds);
  // Shifting the decimal point in the text avoids 1.005 × 100 = 100.49999…
  const shifted = text.includes('e') ? pounds * 100 : Number(`${text}e2`);
  return Math.round(shifted);
}
