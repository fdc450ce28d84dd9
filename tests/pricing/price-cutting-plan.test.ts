import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { priceCuttingPlan, priceCuttingPlanInputSchema, toPence } from '@/lib/pricing';

// Prices below are invented for the examples; each total is worked by hand in the comment beside it.
describe('priceCuttingPlan', () => {
  it('prices stock boards, free offcuts and saw cuts', () => {
    const price = priceCuttingPlan({
      sections: [
        {
          sectionName: '47x100 C24',
          boards: [
            { source: 'stock', length: 4800, cost: 9.6, cuts: 2 },
            { source: 'stock', length: 4800, cost: 9.6, cuts: 2 },
            { source: 'stock', length: 3600, cost: 7.25, cuts: 1 },
            { source: 'offcut', length: 1250, cost: 0, cuts: 1 },
          ],
        },
      ],
      perCutCharge: 0.35,
    });
    // materials: 2 × 9.60 + 7.25 = 26.45; offcut free; cuts 2 + 2 + 1 + 1 = 6 × 0.35 = 2.10; total 28.55
    expect(price.lines).toEqual([
      {
        description: '47x100 C24, 4800 mm stock length',
        quantity: 2,
        unit: 'board',
        unitPrice: 9.6,
        amount: 19.2,
      },
      {
        description: '47x100 C24, 3600 mm stock length',
        quantity: 1,
        unit: 'board',
        unitPrice: 7.25,
        amount: 7.25,
      },
      {
        description: '47x100 C24, offcuts from the rack (1 piece), no charge',
        quantity: 1.25,
        unit: 'metre',
        unitPrice: 0,
        amount: 0,
      },
      { description: 'Cutting to length', quantity: 6, unit: 'cut', unitPrice: 0.35, amount: 2.1 },
    ]);
    expect(price.materials).toBe(26.45);
    expect(price.cutting).toBe(2.1);
    expect(price.total).toBe(28.55);
  });

  it('charges offcuts per metre on their total length, rounded once to the penny', () => {
    const price = priceCuttingPlan({
      sections: [
        {
          sectionName: '38x89 CLS',
          boards: [
            { source: 'offcut', length: 1250, cost: 0, cuts: 0 },
            { source: 'offcut', length: 333, cost: 0, cuts: 0 },
          ],
        },
      ],
      perCutCharge: 0.5,
      offcutPricePerMetre: 1.1,
    });
    // 1250 + 333 = 1583 mm = 1.583 m × £1.10 = £1.7413 → £1.74; no cuts, so no cutting line
    expect(price.lines).toEqual([
      {
        description: '38x89 CLS, offcuts from the rack (2 pieces)',
        quantity: 1.583,
        unit: 'metre',
        unitPrice: 1.1,
        amount: 1.74,
      },
    ]);
    expect(price.total).toBe(1.74);
    expect(price.cutting).toBe(0);
  });

  it('keeps sections apart and sums pennies without drift', () => {
    const boards = Array.from({ length: 10 }, () => ({
      source: 'stock' as const,
      length: 2400,
      cost: 0.1,
      cuts: 1,
    }));
    const price = priceCuttingPlan({
      sections: [
        { sectionName: 'A', boards },
        { sectionName: 'B', boards },
      ],
      perCutCharge: 0.1,
    });
    // 20 boards × £0.10 = £2.00 (0.1 summed in floating point twenty times would give 2.0000000000000004); 20 cuts × £0.10 = £2.00
    expect(price.lines.map((line) => line.description)).toEqual([
      'A, 2400 mm stock length',
      'B, 2400 mm stock length',
      'Cutting to length',
    ]);
    expect(price.materials).toBe(2);
    expect(price.total).toBe(4);
  });

  it('prices an empty plan at zero', () => {
    expect(priceCuttingPlan({ sections: [], perCutCharge: 0.35 })).toEqual({
      lines: [],
      materials: 0,
      cutting: 0,
      total: 0,
    });
  });

  it('refuses negative charges and bad boards', () => {
    expect(() => priceCuttingPlan({ sections: [], perCutCharge: -1 })).toThrow(RangeError);
    expect(() =>
      priceCuttingPlan({
        sections: [{ sectionName: 'A', boards: [{ source: 'stock', length: 2400.5, cost: 1, cuts: 0 }] }],
        perCutCharge: 0,
      }),
    ).toThrow(RangeError);
    expect(priceCuttingPlanInputSchema.safeParse({ sections: [], perCutCharge: -1 }).success).toBe(false);
    expect(
      priceCuttingPlanInputSchema.safeParse({ sections: [], perCutCharge: 0.35, offcutPricePerMetre: null })
        .success,
    ).toBe(true);
  });

  it('the total is always materials plus cutting, and every amount is whole pence', () => {
    const board = fc.record({
      source: fc.constantFrom('stock' as const, 'offcut' as const),
      length: fc.integer({ min: 1, max: 7200 }),
      cost: fc.integer({ min: 0, max: 5000 }).map((p) => p / 100),
      cuts: fc.integer({ min: 0, max: 12 }),
    });
    const input = fc.record({
      sections: fc.array(
        fc.record({ sectionName: fc.constantFrom('A', 'B'), boards: fc.array(board, { maxLength: 8 }) }),
        { maxLength: 3 },
      ),
      perCutCharge: fc.integer({ min: 0, max: 200 }).map((p) => p / 100),
      offcutPricePerMetre: fc.option(fc.integer({ min: 0, max: 500 }).map((p) => p / 100)),
    });
    fc.assert(
      fc.property(input, (plan) => {
        const price = priceCuttingPlan(plan);
        const pence = (n: number) => Math.round(n * 100);
        expect(pence(price.total)).toBe(pence(price.materials) + pence(price.cutting));
        expect(price.lines.reduce((sum, line) => sum + pence(line.amount), 0)).toBe(pence(price.total));
        for (const line of price.lines)
          expect(Math.abs(line.amount * 100 - pence(line.amount))).toBeLessThan(1e-6);
      }),
    );
  });
});

describe('toPence', () => {
  it('rounds as written: £1.005 → 101p, not 100p from 100.49999…', () => {
    expect(toPence(1.005)).toBe(101);
    expect(toPence(9.6)).toBe(960);
    expect(toPence(0.35)).toBe(35);
    expect(toPence(1e-7)).toBe(0);
  });
});
