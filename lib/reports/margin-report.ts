// Margin on each quoted plan: what the customer is charged before VAT against what the timber cost
// the yard. New stock counts at its cost price; rack offcuts at the section's cost per metre. Where a
// cost price is not entered the selling price stands in, and the row says so. Pure.
export type MarginBoard = {
  source: 'stock' | 'offcut';
  lengthMm: number;
  /** Cost of this stock length, null when not entered. */
  costPence: number | null;
  pricePence: number | null;
  /** Cost per metre of the section (offcuts). */
  costPerMetrePence: number;
};

export type QuotedPlanRow = {
  planId: number;
  jobReference: string;
  customerName: string;
  netPence: number;
  boards: MarginBoard[];
};

export type MarginLine = Omit<QuotedPlanRow, 'boards'> & {
  timberCostPence: number;
  marginPence: number;
  /** One decimal; null when nothing was charged. */
  marginPercent: number | null;
  /** Some stock lengths have no cost price, so their selling price was used. */
  costMissing: boolean;
};

export function computeMarginReport(plans: QuotedPlanRow[]) {
  const jobs: MarginLine[] = plans.map(({ boards, ...p }) => {
    let exact = 0;
    let costMissing = false;
    for (const b of boards) {
      if (b.source === 'offcut') exact += (b.lengthMm * b.costPerMetrePence) / 1000;
      else {
        if (b.costPence === null) costMissing = true;
        exact += b.costPence ?? b.pricePence ?? 0;
      }
    }
    const timberCostPence = Math.round(exact);
    const marginPence = p.netPence - timberCostPence;
    return {
      ...p,
      timberCostPence,
      marginPence,
      marginPercent: percent(marginPence, p.netPence),
      costMissing,
    };
  });
  const netPence = jobs.reduce((n, j) => n + j.netPence, 0);
  const timberCostPence = jobs.reduce((n, j) => n + j.timberCostPence, 0);
  return {
    jobs,
    totals: {
      netPence,
      timberCostPence,
      marginPence: netPence - timberCostPence,
      marginPercent: percent(netPence - timberCostPence, netPence),
      costMissing: jobs.some((j) => j.costMissing),
    },
  };
}
export type MarginReport = ReturnType<typeof computeMarginReport>;

const percent = (part: number, whole: number) => (whole > 0 ? Math.round((1000 * part) / whole) / 10 : null);
