'use client';

import { lengthText } from './stock-length-label';
import { useQuery } from '@tanstack/react-query';
import { cardClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { DisplayUnit } from '@/db/enums';
import { stockMovementsQuery } from '@/lib/queries/stock';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { cn } from '@/lib/cn';

const KIND_NAMES: Record<string, string> = { receipt: 'Delivery', stocktake: 'Stocktake' };

/** The audit trail of deliveries and counts: who, when and why. */
export function RecentMovements({ unit }: { unit: DisplayUnit }) {
  const movements = useQuery(stockMovementsQuery());
  if (movements.error) return <Notice tone="error">{movements.error.message}</Notice>;
  return (
    <ScrollRegion label="Recent stock movements" className={cn(cardClass, 'p-0')}>
      <table className="w-full text-left text-sm" data-testid="movements-table">
        <thead className="bg-shaving">
          <tr>
            <th className="p-2">When</th>
            <th className="p-2">What</th>
            <th className="p-2">Stock length</th>
            <th className="p-2 text-right">Change</th>
            <th className="p-2">Why</th>
            <th className="p-2">Who</th>
          </tr>
        </thead>
        <tbody>
          {(movements.data ?? []).map((m) => (
            <tr key={m.id} className="border-t border-shaving">
              <td className="p-2 whitespace-nowrap">
                {new Date(m.at).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}
              </td>
              <td className="p-2">{KIND_NAMES[m.kind] ?? m.kind}</td>
              <td className="p-2">
                {m.sectionName} — {lengthText(m.lengthMm, unit)}
              </td>
              <td
                className={`p-2 text-right font-semibold ${m.quantityDelta < 0 ? 'text-brick' : 'text-spruce-dark'}`}
              >
                {m.quantityDelta > 0 ? '+' : ''}
                {m.quantityDelta}
              </td>
              <td className="p-2">{m.reason}</td>
              <td className="p-2">{m.userName ?? '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {movements.isPending && <p className="p-3">Loading…</p>}
    </ScrollRegion>
  );
}
