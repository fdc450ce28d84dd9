import { describe, expect, it } from 'vitest';
import { computeMarginReport, type MarginBoard } from '@/lib/reports/margin-report';

// Invented fixtures; every expected figure is worked by hand beside it.
const stock = (costPence: number | null, pricePence: number): MarginBoard => ({
  source: 'stock',
  lengthMm: 4800,
  costPence,
  pricePence,
  costPerMetrePence: 125,
});
const offcut = (lengthMm: number): MarginBoard => ({
  source: 'offcut',
  lengthMm,
  costPence: null,
  pricePence: null,
  costPerMetrePence: 125,
});

describe('margin report', () => {
  it('sets the net charge against stock at cost and rack offcuts at cost per metre', () => {
    const report = computeMarginReport([
      // 2 × 600 p + 1.2 m × 125 p/m = 1350 p of timber; charged 2000 p: margin 650 p, 32.5 %.
      {
        planId: 1,
        jobReference: 'J-1',
        customerName: 'A',
        netPence: 2000,
        boards: [stock(600, 960), stock(600, 960), offcut(1200)],
      },
      // No cost entered: the selling price 960 p stands in, and the row says so. Margin 40 p of 1000 p, 4 %.
      { planId: 2, jobReference: 'J-2', customerName: 'B', netPence: 1000, boards: [stock(null, 960)] },
    ]);
    expect(
      report.jobs.map((j) => [j.timberCostPence, j.marginPence, j.marginPercent, j.costMissing]),
    ).toEqual([
      [1350, 650, 32.5, false],
      [960, 40, 4, true],
    ]);
    // 3000 − 2310 = 690 p, 23 % of 3000 p.
    expect(report.totals).toEqual({
      netPence: 3000,
      timberCostPence: 2310,
      marginPence: 690,
      marginPercent: 23,
      costMissing: true,
    });
  });

  it('gives no percentage for a plan charged nothing', () => {
    const report = computeMarginReport([
      { planId: 3, jobReference: 'J-3', customerName: 'C', netPence: 0, boards: [offcut(1000)] },
    ]);
    expect(report.jobs[0]).toMatchObject({ timberCostPence: 125, marginPence: -125, marginPercent: null });
  });
});
