// VAT arithmetic in whole pence. Rates are in hundredths of a percent (2000 = 20 %).
//
// Rounding rule. Trade quotes (net prices, VAT added): VAT is worked out once on the quote's net
// total and any fraction of a penny is dropped, which HMRC VAT Notice 700 ("The VAT Guide"),
// paragraph 17.5 allows for VAT calculated at invoice level (as HMRC's internal manual VATREC12010
// summarises it: the VAT payable "may be rounded down" to a whole penny).
// Retail quotes (VAT-inclusive prices): the VAT content is the VAT fraction of the gross
// (rate / (100 + rate), 1/6 at 20 %), rounded to the nearest penny, halves up — Notice 700 does not
// let a trader who is not on a retail scheme round this figure down (paragraph number from memory).

/** VAT to add to a net amount, fraction of a penny dropped. */
export function vatOnNet(netPence: number, rateBasisPoints: number): number {
  checkWhole(netPence, rateBasisPoints);
  return Math.floor((netPence * rateBasisPoints) / 10_000);
}

/** The VAT contained in a VAT-inclusive amount, to the nearest penny (halves up). */
export function vatInGross(grossPence: number, rateBasisPoints: number): number {
  checkWhole(grossPence, rateBasisPoints);
  const denominator = 10_000 + rateBasisPoints;
  // Integer form of round(gross × rate / (1 + rate)), so no binary fraction can tip a half.
  return Math.floor((2 * grossPence * rateBasisPoints + denominator) / (2 * denominator));
}

/** A net amount with VAT added, to the nearest penny: how a retail line is shown VAT-inclusive. */
export function grossOf(netPence: number, rateBasisPoints: number): number {
  checkWhole(netPence, rateBasisPoints);
  return Math.floor((2 * netPence * (10_000 + rateBasisPoints) + 10_000) / 20_000);
}

function checkWhole(pence: number, rate: number) {
  if (!Number.isSafeInteger(pence) || !Number.isSafeInteger(rate) || rate < 0) {
    throw new RangeError('VAT is worked on whole pence and a whole, non-negative rate.');
  }
}
