'use client';

import { useFormatLength } from '@/components/units/display-unit';
import type { PlanViewData } from '@/lib/queries/plans';
import { describeGap } from './gap-words';
import { countBoardsByLength } from '@/lib/plans/group-boards';
import { BaselineComparison } from './baseline-comparison';
import { formatPence } from '@/lib/format/money';

/** Totals over the plan (boards per length, offcuts, waste, yield, kept) and the price. */
export function PlanFigures({ plan }: { plan: PlanViewData }) {
  const fmt = useFormatLength();
  const t = plan.totals;
  const waste =
    t.materialMm > 0
      ? Math.round((1000 * (t.scrapMm + t.kerfLossMm)) / (t.materialMm - t.keptMm || 1)) / 10
      : 0;
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <div data-testid="plan-totals">
        <h2 className="mb-2 text-xl font-bold">Totals</h2>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1">
          <dt>Boards</dt>
          <dd className="text-right font-semibold tabular-nums">
            {t.boards} ({t.stockBoards} new, {t.offcutsUsed} offcut{t.offcutsUsed === 1 ? '' : 's'})
          </dd>
          <dt>Yield</dt>
          <dd className="text-right font-semibold tabular-nums">{t.yieldPercent}%</dd>
          <dt>Waste (scrap and kerf)</dt>
          <dd className="text-right tabular-nums">
            {waste}% · {fmt(t.scrapMm + t.kerfLossMm)}
          </dd>
          <dt>Kept offcuts</dt>
          <dd className="text-right tabular-nums">
            {t.keptOffcuts} · {fmt(t.keptMm)}
          </dd>
          <dt>Saw cuts</dt>
          <dd className="text-right tabular-nums">{t.cuts}</dd>
        </dl>
        <BaselineComparison totals={t} />
        <p className="mt-3 rounded-lg bg-spruce-light p-3 text-spruce-dark" data-testid="plan-gap">
          {describeGap(t)}
        </p>
        {t.unplacedPieces > 0 && (
          <p className="mt-2 font-semibold text-brick">
            {t.unplacedPieces} piece length{t.unplacedPieces === 1 ? '' : 's'} could not be placed from the
            stock allowed.
          </p>
        )}
        <h3 className="mt-4 font-semibold">Boards per length</h3>
        <ul className="text-sm">
          {plan.sections.map((s) => (
            <li key={s.sectionId}>
              <span className="font-semibold">{s.sectionName}:</span>{' '}
              {countBoardsByLength(plan.boards.filter((b) => b.sectionId === s.sectionId))
                .map((c) =>
                  c.source === 'offcut'
                    ? `${c.count} offcut${c.count === 1 ? '' : 's'}`
                    : `${c.count} × ${fmt(c.lengthMm)}`,
                )
                .join(', ')}
            </li>
          ))}
        </ul>
      </div>
      <div data-testid="plan-price">
        <h2 className="mb-2 text-xl font-bold">Price</h2>
        {plan.price ? (
          <table className="w-full text-left text-sm">
            <tbody>
              {plan.price.lines.map((line, i) => (
                <tr key={i} className="border-b border-shaving">
                  <td className="py-1">{line.description}</td>
                  <td className="py-1 text-right tabular-nums">
                    {line.quantity} × {formatPence(line.unitPence)}
                  </td>
                  <td className="py-1 text-right tabular-nums">{formatPence(line.amountPence)}</td>
                </tr>
              ))}
            </tbody>
            <tfoot>
              <tr>
                <td className="pt-2">Timber</td>
                <td />
                <td className="pt-2 text-right tabular-nums">{formatPence(plan.price.materialsPence)}</td>
              </tr>
              <tr>
                <td>Cutting</td>
                <td />
                <td className="text-right tabular-nums">{formatPence(plan.price.cuttingPence)}</td>
              </tr>
              <tr className="text-lg font-bold">
                <td>Total</td>
                <td />
                <td className="text-right tabular-nums" data-testid="plan-total-price">
                  {formatPence(plan.price.totalPence)}
                </td>
              </tr>
            </tfoot>
          </table>
        ) : (
          <p>{formatPence(plan.pricePence)}</p>
        )}
      </div>
    </div>
  );
}
