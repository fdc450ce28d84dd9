'use client';

import { useQueries } from '@tanstack/react-query';
import Link from 'next/link';
import { cardClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useFormatLength } from '@/components/units/display-unit';
import { planQuery, type PlanViewData } from '@/lib/queries/plans';
import { describeGap } from './gap-words';
import { countBoardsByLength } from '@/lib/plans/group-boards';
import { formatPence } from '@/lib/format/money';
import { ScrollRegion } from '@/components/ui/scroll-region';

type Row = {
  label: string;
  value: (p: PlanViewData) => number;
  show: (p: PlanViewData) => string;
  better: 'low' | 'high';
};

/** Two plans of a job side by side: settings, figures, price; the better figure of each row is marked. */
export function PlanCompare({ ids }: { ids: [number, number] }) {
  const fmt = useFormatLength();
  const [a, b] = useQueries({ queries: ids.map((id) => planQuery(id)) });
  if (a.error || b.error) return <Notice tone="error">{(a.error ?? b.error)!.message}</Notice>;
  if (!a.data || !b.data) return <p>Loading both plans…</p>;
  const plans = [a.data, b.data];
  const rows: Row[] = [
    { label: 'Price', value: (p) => p.pricePence, show: (p) => formatPence(p.pricePence), better: 'low' },
    { label: 'Boards', value: (p) => p.totals.boards, show: (p) => String(p.totals.boards), better: 'low' },
    {
      label: 'Offcuts used',
      value: (p) => p.totals.offcutsUsed,
      show: (p) => String(p.totals.offcutsUsed),
      better: 'high',
    },
    {
      label: 'Yield',
      value: (p) => p.totals.yieldPercent,
      show: (p) => `${p.totals.yieldPercent}%`,
      better: 'high',
    },
    { label: 'Scrap', value: (p) => p.totals.scrapMm, show: (p) => fmt(p.totals.scrapMm), better: 'low' },
    {
      label: 'Kept offcuts',
      value: (p) => p.totals.keptMm,
      show: (p) => `${p.totals.keptOffcuts} · ${fmt(p.totals.keptMm)}`,
      better: 'high',
    },
    { label: 'Saw cuts', value: (p) => p.totals.cuts, show: (p) => String(p.totals.cuts), better: 'low' },
  ];
  const best = (row: Row, p: PlanViewData) => {
    const [x, y] = plans.map(row.value);
    if (x === y) return false;
    const winner = row.better === 'low' ? Math.min(x, y) : Math.max(x, y);
    return row.value(p) === winner;
  };
  return (
    <ScrollRegion label="Plans compared" className={cardClass}>
      <table className="w-full text-left" data-testid="plan-compare">
        <thead>
          <tr className="border-b-2 border-grain">
            <th className="p-2" />
            {plans.map((p) => (
              <th key={p.id} className="p-2">
                <Link className="text-spruce underline" href={`/plans/${p.id}`}>
                  Plan {p.id}
                </Link>
                <span className="block text-sm font-normal text-bark-soft">
                  {p.status} · kerf {p.settings.kerfMm}, trim {p.settings.trimMm}, keep from{' '}
                  {p.settings.minOffcutMm}
                  {p.settings.useOffcuts ? '' : ', no rack'}
                </span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.label} className="border-b border-shaving">
              <th className="p-2 font-semibold">{row.label}</th>
              {plans.map((p) => (
                <td key={p.id} className={best(row, p) ? 'p-2 font-bold text-spruce-dark' : 'p-2'}>
                  {row.show(p)} {best(row, p) && <span className="text-sm">(better)</span>}
                </td>
              ))}
            </tr>
          ))}
          <tr className="border-b border-shaving align-top">
            <th className="p-2 font-semibold">Boards per length</th>
            {plans.map((p) => (
              <td key={p.id} className="p-2 text-sm">
                {p.sections.map((s) => (
                  <p key={s.sectionId}>
                    {s.sectionName}:{' '}
                    {countBoardsByLength(p.boards.filter((x) => x.sectionId === s.sectionId))
                      .map((c) =>
                        c.source === 'offcut'
                          ? `${c.count} offcut${c.count === 1 ? '' : 's'}`
                          : `${c.count} × ${fmt(c.lengthMm)}`,
                      )
                      .join(', ')}
                  </p>
                ))}
              </td>
            ))}
          </tr>
          <tr className="align-top">
            <th className="p-2 font-semibold">Lower bound</th>
            {plans.map((p) => (
              <td key={p.id} className="p-2 text-sm">
                {describeGap(p.totals)}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </ScrollRegion>
  );
}
