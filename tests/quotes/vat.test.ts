import { describe, expect, it } from 'vitest';
import { priceQuote, type PriceQuoteInput } from '@/lib/quotes/price-quote';
import { grossOf, vatInGross, vatOnNet } from '@/lib/quotes/vat';

// UK standard rate of VAT: 20 % (published: GOV.UK, "VAT rates", standard rate 20 % since 4 January 2011).
const UK_STANDARD_RATE = 2000;

describe('VAT at the UK standard rate', () => {
  // Published worked example: HMRC, "Calculating VAT for VAT-inclusive and VAT-exclusive prices"
  // (hmrc.gov.uk/vat/forms-rates/rates/calculating.htm): price excluding VAT £100, VAT at 20 % £20,
  // price including VAT £120.
  it('adds £20 to £100 net, making £120', () => {
    expect(vatOnNet(100_00, UK_STANDARD_RATE)).toBe(20_00);
    expect(grossOf(100_00, UK_STANDARD_RATE)).toBe(120_00);
  });

  // Same HMRC page: the VAT in a VAT-inclusive price is found with the VAT fraction, 1/6 at 20 %:
  // £120 × 1/6 = £20.
  it('finds £20 of VAT in £120 VAT-inclusive (the VAT fraction 1/6)', () => {
    expect(vatInGross(120_00, UK_STANDARD_RATE)).toBe(20_00);
  });

  // The rounding rule (VAT Notice 700 paragraph 17.5, see lib/quotes/vat.ts): VAT worked at invoice
  // level may drop the fraction of a penny. These figures are the rule applied, not published values.
  it('drops a fraction of a penny of VAT on a net total, and never rounds it up', () => {
    expect(vatOnNet(1_04, UK_STANDARD_RATE)).toBe(20); // 20.8p → 20p
    expect(vatOnNet(1_02, UK_STANDARD_RATE)).toBe(20); // 20.4p → 20p
    for (let net = 0; net < 2_000; net++) {
      const vat = vatOnNet(net, UK_STANDARD_RATE);
      expect(vat * 10_000).toBeLessThanOrEqual(net * UK_STANDARD_RATE);
      expect((vat + 1) * 10_000).toBeGreaterThan(net * UK_STANDARD_RATE);
    }
  });

  it('rounds the VAT content of a gross to the nearest penny, halves up', () => {
    expect(vatInGross(3, UK_STANDARD_RATE)).toBe(1); // 0.5p → 1p
    expect(vatInGross(2, UK_STANDARD_RATE)).toBe(0); // 0.33p → 0p
    expect(vatInGross(1_00, UK_STANDARD_RATE)).toBe(17); // 16.67p → 17p
  });

  it('refuses fractions of a penny as input', () => {
    expect(() => vatOnNet(10.5, UK_STANDARD_RATE)).toThrow(RangeError);
  });
});

const base: PriceQuoteInput = {
  boards: [],
  sectionRates: new Map(),
  perCutPence: 0,
  offcutRatePercent: 50,
  deliveryPence: 0,
  minimumChargePence: 0,
  account: 'trade',
  discountPercent: 0,
  vatRateBasisPoints: UK_STANDARD_RATE,
  depositPercent: 50,
};

describe('a quote priced on the published example', () => {
  // HMRC's £100 example as one £100 board on a trade (ex VAT) quote and on a retail quote.
  const board = {
    sectionId: 1,
    sectionName: '47×100 sawn',
    source: 'stock' as const,
    lengthMm: 4800,
    pricePence: 100_00,
    cuts: 0,
  };

  it('trade: £100.00 before VAT, VAT £20.00, total £120.00', () => {
    const q = priceQuote({ ...base, boards: [board] });
    expect([q.netPence, q.vatPence, q.grossPence]).toEqual([100_00, 20_00, 120_00]);
    expect(q.depositPence).toBe(60_00);
  });

  it('retail: lines VAT-inclusive, £120.00 including VAT of £20.00', () => {
    const q = priceQuote({ ...base, account: 'retail', boards: [board] });
    expect(q.lines[0].grossAmountPence).toBe(120_00);
    expect([q.grossPence, q.vatPence, q.netPence]).toEqual([120_00, 20_00, 100_00]);
  });
});

describe('quote lines in whole pence', () => {
  it('charges rack offcuts at the offcut rate of the section’s cheapest price per metre', () => {
    // 3 offcuts, 6.66 m in all; cheapest stock £9.60 for 4.8 m = £2.00/m; 50 % → £1.00/m → £6.66.
    const offcut = (lengthMm: number) => ({
      sectionId: 1,
      sectionName: 'S',
      source: 'offcut' as const,
      lengthMm,
      pricePence: 0,
      cuts: 1,
    });
    const q = priceQuote({
      ...base,
      boards: [offcut(2220), offcut(2220), offcut(2220)],
      sectionRates: new Map([[1, { pricePence: 9_60, lengthMm: 4800 }]]),
      perCutPence: 25,
    });
    expect(q.lines[0]).toMatchObject({ quantity: 6.66, unitPence: 1_00, amountPence: 6_66 });
    expect(q.lines[0].description).toContain('3 offcuts from the rack at 50 %');
    expect(q.lines[1]).toMatchObject({ description: 'Cutting to length', quantity: 3, amountPence: 75 });
    expect(q.netPence).toBe(7_41);
  });

  it('takes a trade discount off timber only, adds delivery, and tops up to the minimum charge', () => {
    const q = priceQuote({
      ...base,
      discountPercent: 10,
      deliveryPence: 15_00,
      minimumChargePence: 50_00,
      perCutPence: 25,
      boards: [
        { sectionId: 1, sectionName: 'S', source: 'stock', lengthMm: 2400, pricePence: 10_00, cuts: 2 },
      ],
    });
    expect(q.lines.map((l) => l.amountPence)).toEqual([10_00, -1_00, 50, 15_00, 25_50]);
    expect(q.netPence).toBe(50_00);
    expect(q.vatPence).toBe(10_00);
  });
});
