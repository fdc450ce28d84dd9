import type { PlanTotals } from '@/lib/plans/plan-shapes';
import { formatPence } from '@/lib/format/money';

type Figures = Pick<PlanTotals, 'stockBoards' | 'stockCostPence' | 'offcutsUsed' | 'baseline'>;

/**
 * This plan against a plain longest-first plan, like with like: new boards and what the new timber
 * costs at yard prices (longest-first uses no rack offcuts), never the plan's price with cutting.
 */
export function BaselineComparison({ totals: t }: { totals: Figures }) {
  const saved = t.baseline.stockCostPence - t.stockCostPence;
  const s = (n: number) => (n === 1 ? '' : 's');
  return (
    <table className="mt-3 w-full text-left text-sm tabular-nums" data-testid="plan-baseline">
      <caption className="text-left font-semibold">New timber bought</caption>
      <thead>
        <tr className="border-b border-shaving">
          <th className="py-1 font-normal">Plan</th>
          <th className="py-1 text-right font-normal">New boards</th>
          <th className="py-1 text-right font-normal">Timber at yard prices</th>
        </tr>
      </thead>
      <tbody>
        <tr>
          <td className="py-1">
            This plan{t.offcutsUsed > 0 ? ` (and ${t.offcutsUsed} rack offcut${s(t.offcutsUsed)})` : ''}
          </td>
          <td className="py-1 text-right font-semibold">{t.stockBoards}</td>
          <td className="py-1 text-right font-semibold">{formatPence(t.stockCostPence)}</td>
        </tr>
        <tr>
          <td className="py-1">Longest-first, new stock only</td>
          <td className="py-1 text-right">{t.baseline.boards}</td>
          <td className="py-1 text-right">{formatPence(t.baseline.stockCostPence)}</td>
        </tr>
      </tbody>
      <tfoot>
        <tr>
          <td colSpan={3} className="pt-1" data-testid="plan-baseline-saving">
            {saved > 0
              ? `This plan buys ${formatPence(saved)} less new timber than longest-first.`
              : saved === 0
                ? 'This plan buys as much new timber as longest-first.'
                : `This plan buys ${formatPence(-saved)} more new timber than longest-first.`}
          </td>
        </tr>
      </tfoot>
    </table>
  );
}
