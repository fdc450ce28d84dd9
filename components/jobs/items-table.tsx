'use client';

import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useDisplayUnit } from '@/components/units/display-unit';
import { addItemRequest, deleteItemRequest, updateItemRequest, type JobItemRow } from '@/lib/queries/jobs';
import { sectionOptionsQuery } from '@/lib/queries/sections';
import { ItemRow } from './item-row';
import { sumItemsPerSection } from './section-totals';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { jobKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { JobItemBodyInput } from '@/lib/validations/jobs';

const PAGE = 200;

type ItemChange =
  | { kind: 'add'; body: JobItemBodyInput }
  | { kind: 'update'; itemId: number; body: JobItemBodyInput }
  | { kind: 'delete'; itemId: number };

/** The job's cut list as an editable table, with pieces and running length per section. */
export function ItemsTable({
  jobId,
  items,
  editable,
}: {
  jobId: number;
  items: JobItemRow[];
  editable: boolean;
}) {
  const queryClient = useQueryClient();
  const sections = useQuery(sectionOptionsQuery());
  const { format, suffix } = useDisplayUnit();
  const [shown, setShown] = useState(PAGE);
  const refresh = () => queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) });
  // One mutation for every row: the table shows its error; a failed change also refreshes the list.
  const change = useApiMutation({
    mutationFn: (c: ItemChange): Promise<unknown> =>
      c.kind === 'add'
        ? addItemRequest(jobId, c.body)
        : c.kind === 'update'
          ? updateItemRequest(jobId, c.itemId, c.body)
          : deleteItemRequest(jobId, c.itemId),
    invalidates: [jobKeys.detail(jobId)],
    onError: () => refresh(),
  });
  const totals = sumItemsPerSection(items);

  return (
    <div className="space-y-3">
      {change.error && <Notice tone="error">{change.error.message}</Notice>}
      <ScrollRegion label="Line items">
        <table className="w-full text-left" data-testid="items-table">
          <thead className="bg-shaving text-sm">
            <tr>
              <th className="p-2">Section</th>
              <th className="p-2 text-right">Length</th>
              <th className="p-2 text-right">Qty</th>
              <th className="p-2">Exact or nominal</th>
              <th className="p-2">Label</th>
              <th className="p-2">Note</th>
              <th className="p-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {items.slice(0, shown).map((item) => (
              <ItemRow
                key={item.id}
                item={item}
                sections={sections.data ?? []}
                editable={editable}
                onSave={(body) => change.mutateAsync({ kind: 'update', itemId: item.id, body })}
                onDelete={() => change.mutateAsync({ kind: 'delete', itemId: item.id })}
              />
            ))}
            {editable && sections.data && (
              <ItemRow
                sections={sections.data}
                editable
                defaultSectionId={items.at(-1)?.sectionId}
                onSave={(body) => change.mutateAsync({ kind: 'add', body })}
              />
            )}
          </tbody>
        </table>
      </ScrollRegion>
      {items.length > shown && (
        <Button variant="secondary" onClick={() => setShown((n) => n + PAGE * 5)}>
          Show more rows ({items.length - shown} not shown)
        </Button>
      )}
      {totals.length > 0 && (
        <table className="w-full max-w-2xl text-left text-sm" data-testid="section-totals">
          <caption className="mb-1 text-left font-semibold">Totals per section</caption>
          <thead>
            <tr className="border-b-2 border-grain">
              <th className="py-1">Section</th>
              <th className="py-1 text-right">Rows</th>
              <th className="py-1 text-right">Pieces</th>
              <th className="py-1 text-right">Running length</th>
            </tr>
          </thead>
          <tbody>
            {totals.map((t) => (
              <tr key={t.sectionId} className="border-b border-shaving">
                <td className="py-1">{t.sectionName}</td>
                <td className="py-1 text-right tabular-nums">{t.rows}</td>
                <td className="py-1 text-right tabular-nums">{t.pieces}</td>
                <td className="py-1 text-right tabular-nums">
                  {format(t.lengthMm)}
                  {suffix}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
