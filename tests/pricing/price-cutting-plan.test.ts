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
            { source: 'stock', length: 4800, costPence: 960, cuts: 2 },
            { source: 'stock', length: 4800, costPence: 960, cuts: 2 },
            { source: 'stock', length: 3600, costPence: 725, cuts: 1 },
            { source: 'offcut', length: 1250, costPence: 0, cuts: 1 },
          ],
        },
      ],
      perCutPence: 35,
    });
    // materials: 2 × 9.60 + 7.25 = 26.45; offcut free; cuts 2 + 2 + 1 + 1 = 6 × 0.35 = 2.10; total 28.55
    expect(price.lines).toEqual([
      {
        description: '47x100 C24, 4800 mm stock length',
        quantity: 2,
        unit: 'board',
        unitPence: 960,
        amountPence: 1920,
      },
      {
        description: '47x100 C24, 3600 mm stock length',
        quantity: 1,
        unit: 'board',
        unitPence: 725,
        amountPence: 725,
      },
      {
        description: '47x100 C24, offcuts from the rack (1 piece), no charge',
        quantity: 1.25,
        unit: 'metre',
        unitPence: 0,
        amountPence: 0,
      },
      { description: 'Cutting to length', quantity: 6, unit: 'cut', unitPence: 35, amountPence: 210 },
    ]);
    expect(price.materialsPence).toBe(2645);
    expect(price.cuttingPence).toBe(210);
    expect(price.totalPence).toBe(2855);
  });

  it('charges offcuts per metre on their total length, rounded once to the penny', () => {
    const price = priceCuttingPlan({
      sections: [
        {
          sectionName: '38x89 CLS',
          boards: [
            { source: 'offcut', length: 1250, costPence: 0, cuts: 0 },
            { source: 'offcut', length: 333, costPence: 0, cuts: 0 },
          ],
        },
      ],
      perCutPence: 50,
      offcutPencePerMetre: 110,
    });
    // 1250 + 333 = 1583 mm = 1.583 m × £1.10 = £1.7413 → £1.74; no cuts, so no cutting line
    expect(price.lines).toEqual([
      {
        description: '38x89 CLS, offcuts from the rack (2 pieces)',
        quantity: 1.583,
        unit: 'metre',
        unitPence: 110,
        amountPence: 174,
      },
    ]);
    expect(price.totalPence).toBe(174);
    expect(price.cuttingPence).toBe(0);
  });

  it('keeps sections apart and adds them up', () => {
    const boards = Array.from({ length: 10 }, () => ({
      source: 'stock' as const,
      length: 2400,
      costPence: 10,
      cuts: 1,
    }));
    const price = priceCuttingPlan({
      sections: [
        { sectionName: 'A', boards },
        { sectionName: 'B', boards },
      ],
      perCutPence: 10,
    });
    // 20 boards × £0.10 = £2.00; 20 cuts × £0.10 = £2.00
    expect(price.lines.map((line) => line.description)).toEqual([
      'A, 2400 mm stock length',
      'B, 2400 mm stock length',
      'Cutting to length',
    ]);
    expect(price.materialsPence).toBe(200);
    expect(price.totalPence).toBe(400);
  });

  it('prices an empty plan at zero', () => {
    expect(priceCuttingPlan({ sections: [], perCutPence: 35 })).toEqual({
      lines: [],
      materialsPence: 0,
      cuttingPence: 0,
      totalPence: 0,
    });
  });

  it('refuses negative or fractional charges and bad boards', () => {
    expect(() => priceCuttingPlan({ sections: [], perCutPence: -1 })).toThrow(RangeError);
    expect(() => priceCuttingPlan({ sections: [], perCutPence: 0.35 })).toThrow(RangeError);
    expect(() =>
      priceCuttingPlan({
        sections: [
          { sectionName: 'A', boards: [{ source: 'stock', length: 2400.5, costPence: 100, cuts: 0 }] },
        ],
        perCutPence: 0,
      }),
    ).toThrow(RangeError);
    expect(() =>
      priceCuttingPlan({
        sections: [
          { sectionName: 'A', boards: [{ source: 'stock', length: 2400, costPence: 9.6, cuts: 0 }] },
        ],
        perCutPence: 0,
      }),
    ).toThrow(RangeError);
    expect(priceCuttingPlanInputSchema.safeParse({ sections: [], perCutPence: -1 }).success).toBe(false);
    expect(priceCuttingPlanInputSchema.safeParse({ sections: [], perCutPence: 0.35 }).success).toBe(false);
    expect(
      priceCuttingPlanInputSchema.safeParse({ sections: [], perCutPence: 35, offcutPencePerMetre: null })
        .success,
    ).toBe(true);
  });

  it('the total is always materials plus cutting, and every amount is whole pence', () => {
    const board = fc.record({
      source: fc.constantFrom('stock' as const, 'offcut' as const),
      length: fc.integer({ min: 1, max: 7200 }),
      costPence: fc.integer({ min: 0, max: 5000 }),
      cuts: fc.integer({ min: 0, max: 12 }),
    });
    const input = fc.record({
      sections: fc.array(
        fc.record({ sectionName: fc.constantFrom('A', 'B'), boards: fc.array(board, { maxLength: 8 }) }),
        { maxLength: 3 },
      ),
      perCutPence: fc.integer({ min: 0, max: 200 }),
      offcutPencePerMetre: fc.option(fc.integer({ min: 0, max: 500 })),
    });
    fc.assert(
      fc.property(input, (plan) => {
        const price = priceCuttingPlan(plan);
        expect(price.totalPence).toBe(price.materialsPence + price.cuttingPence);
        expect(price.lines.reduce((sum, line) => sum + line.amountPence, 0)).toBe(price.totalPence);
        for (const line of price.lines) {
          expect(Number.isInteger(line.unitPence)).toBe(true);
          expect(Number.isInteger(line.amountPence)).toBe(true);
        }
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
