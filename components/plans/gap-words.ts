import type { PlanTotals } from '@/lib/plans/plan-shapes';

/** The lower bound and gap in plain words. */
export function describeGap(totals: Pick<PlanTotals, 'boards' | 'lowerBoundBoards' | 'gapBoards'>): string {
  if (totals.gapBoards <= 0)
    return `No plan can use fewer than ${totals.lowerBoundBoards} boards: this plan is as short as it gets.`;
  const n = totals.gapBoards;
  return `At most ${n} board${n === 1 ? '' : 's'} better is possible: no plan can use fewer than ${totals.lowerBoundBoards}.`;
}
