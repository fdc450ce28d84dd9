import type { PlanTotals } from '@/lib/plans/plan-shapes';
import { formatPence } from '@/lib/format/money';

type GapFigures = Pick<PlanTotals, 'lowerBoundBoards' | 'gapBoards' | 'stockCostPence' | 'lowerBoundPence'>;

/**
 * How far the plan may be from the cheapest, in money and plain words. The bound is on the cost of
 * new stock, so it is compared with the plan's new stock, never with its price.
 */
export function describeGap(totals: GapFigures): string {
  if (typeof totals.lowerBoundPence !== 'number') return describeBoardGap(totals);
  const gap = Math.max(0, totals.stockCostPence - totals.lowerBoundPence);
  if (gap === 0) return 'Cheapest possible: no plan for these pieces can buy its new timber for less.';
  return `At most ${formatPence(gap)} cheaper is possible: no plan for these pieces can buy its new timber for less than ${formatPence(totals.lowerBoundPence)} (this plan: ${formatPence(totals.stockCostPence)}).`;
}

/** Plans made before the bound was kept in pence: boards only. */
function describeBoardGap(totals: GapFigures): string {
  if (totals.gapBoards <= 0)
    return `No plan can use fewer than ${totals.lowerBoundBoards} boards: this plan is as short as it gets.`;
  return `No plan for these pieces can use fewer than ${totals.lowerBoundBoards} boards.`;
}
