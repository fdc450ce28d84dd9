'use client';

import { useQuery } from '@tanstack/react-query';
import { Notice } from '@/components/ui/notice';
import { useFormatLength } from '@/components/units/display-unit';
import { planStockCheckQuery } from '@/lib/queries/plans';

/** Before release: stock lengths the plan needs more of than the yard holds. Silent when nothing is short. */
export function StockShortfalls({ planId }: { planId: number }) {
  const fmt = useFormatLength();
  const check = useQuery(planStockCheckQuery(planId));
  if (!check.data || check.data.short.length === 0) return null;
  return (
    <Notice tone="warning" data-testid="stock-shortfalls">
      <p className="font-semibold">Not enough stock on hand for this plan:</p>
      <ul className="mt-1 list-disc pl-5">
        {check.data.short.map((s) => (
          <li key={s.stockLengthId}>
            {s.sectionName} {fmt(s.lengthMm)}: needs {s.needed}, {s.onHand} on hand
          </li>
        ))}
      </ul>
      <p className="mt-1">
        Receive more stock or plan again without that length; release anyway only once you have seen the
        boards in the yard.
      </p>
    </Notice>
  );
}
