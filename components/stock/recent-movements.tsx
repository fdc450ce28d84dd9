'use client';

import { lengthText } from './stock-length-label';
import { useQuery } from '@tanstack/react-query';
import { cardClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { DisplayUnit } from '@/db/enums';
import { stockMovementsQuery } from '@/lib/queries/stock';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import { cn } from '@/lib/cn';

const KIND_NAMES: Record<string, string> = {
  receipt: 'Delivery',
  stocktake: 'Stocktake',
  stock_cut: 'Cut at the saw',
  counted_short: 'Cut, count was short',
  board_undone: 'Cut taken back',
  defect: 'Bad board',
};

/** The audit trail of deliveries, counts and what the saw used: who, when and why. */
export function RecentMovements({ unit }: { unit: DisplayUnit }) {
  const movements = useQuery(stockMovementsQuery());
  if (movements.error) return <Notice tone="error">{movements.error.message}</Notice>;
  return (
    <ScrollRegion label="Recent stock movements" className={cn(cardClass, 'p-0')}>
      <Table className="text-sm" data-testid="movements-table">
        <TableHead
          density="snug"
          columns={['When', 'What', 'Stock length', { label: 'Change', numeric: true }, 'Why', 'Who']}
        />
        <tbody>
          {(movements.data ?? []).map((m) => (
            <TableRow key={m.id}>
              <Cell density="snug" className="whitespace-nowrap">
                {new Date(m.at).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}
              </Cell>
              <Cell density="snug">{KIND_NAMES[m.kind] ?? m.kind}</Cell>
              <Cell density="snug">
                {m.sectionName} — {lengthText(m.lengthMm, unit)}
              </Cell>
              <Cell
                density="snug"
                numeric
                className={cn('font-semibold', m.quantityDelta < 0 ? 'text-brick' : 'text-spruce-dark')}
              >
                {m.quantityDelta > 0 ? '+' : ''}
                {m.quantityDelta}
              </Cell>
              <Cell density="snug">{m.reason}</Cell>
              <Cell density="snug">{m.userName ?? '—'}</Cell>
            </TableRow>
          ))}
        </tbody>
      </Table>
      {movements.isPending && <p className="p-3">Loading…</p>}
    </ScrollRegion>
  );
}
