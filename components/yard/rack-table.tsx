'use client';

import type { DisplayUnit } from '@/db/enums';
import { lengthText } from '@/components/stock/stock-length-label';
import { Cell, HeadCell, Table, TableHead, TableRow } from '@/components/ui/table';
import type { OffcutRow, RackFilters } from '@/lib/queries/offcuts';
import { OffcutLocationCell } from './offcut-location-cell';

const DAY_MS = 86_400_000;
const COLUMNS = [
  ['tag', 'Tag'],
  ['section', 'Section'],
  ['length', 'Length'],
  ['location', 'Location'],
  ['age', 'Age'],
] as const;

type Props = {
  rows: OffcutRow[];
  unit: DisplayUnit;
  clearAfterDays: number;
  canEdit: boolean;
  chosen: Set<number>;
  onChoose: (ids: number[], on: boolean) => void;
  filters: RackFilters;
  onSort: (sort: string, dir: string) => void;
  onError: (m: string | null) => void;
  /** The page's clock, so ages do not shift between renders. */
  now: number;
};

export function RackTable({
  rows,
  unit,
  clearAfterDays,
  canEdit,
  chosen,
  onChoose,
  filters,
  onSort,
  onError,
  now,
}: Props) {
  const allChosen = rows.length > 0 && rows.every((r) => chosen.has(r.id));
  const sortBy = (key: string) =>
    onSort(key, filters.sort === key && filters.dir === 'desc' ? 'asc' : 'desc');
  return (
    <Table className="text-sm" data-testid="rack-table">
      <TableHead>
        <HeadCell density="snug">
          <input
            type="checkbox"
            aria-label="Choose every offcut on this page"
            checked={allChosen}
            onChange={(e) =>
              onChoose(
                rows.map((r) => r.id),
                e.target.checked,
              )
            }
          />
        </HeadCell>
        {COLUMNS.map(([key, label]) => (
          <HeadCell
            key={key}
            density="snug"
            aria-sort={
              filters.sort === key ? (filters.dir === 'asc' ? 'ascending' : 'descending') : undefined
            }
          >
            <button
              type="button"
              className="font-semibold underline-offset-2 hover:underline"
              onClick={() => sortBy(key)}
            >
              {label}
              {filters.sort === key ? (filters.dir === 'desc' ? ' ▼' : ' ▲') : ''}
            </button>
          </HeadCell>
        ))}
        <HeadCell density="snug">Status</HeadCell>
        <HeadCell density="snug">From</HeadCell>
      </TableHead>
      <tbody>
        {rows.map((o) => {
          const age = Math.floor((now - Date.parse(o.createdAt)) / DAY_MS);
          return (
            <TableRow key={o.id} data-testid={`offcut-row-${o.tag}`}>
              <Cell density="snug">
                <input
                  type="checkbox"
                  aria-label={`Choose ${o.tag}`}
                  checked={chosen.has(o.id)}
                  onChange={(e) => onChoose([o.id], e.target.checked)}
                />
              </Cell>
              <Cell density="snug" className="font-mono font-semibold whitespace-nowrap">
                {o.tag}
              </Cell>
              <Cell density="snug">{o.sectionName}</Cell>
              <Cell density="snug" className="whitespace-nowrap">
                {lengthText(o.lengthMm, unit)}
              </Cell>
              <Cell density="snug">
                <OffcutLocationCell offcut={o} canEdit={canEdit} onError={onError} />
              </Cell>
              <Cell density="snug" className="whitespace-nowrap">
                {age} d
                {age >= clearAfterDays && (o.status === 'available' || o.status === 'reserved') && (
                  <span className="ml-2 rounded bg-amber-light px-1.5 py-0.5 text-xs font-semibold">
                    clear?
                  </span>
                )}
              </Cell>
              <Cell density="snug">
                {o.status}
                {o.scrapReason ? ` — ${o.scrapReason}` : ''}
              </Cell>
              <Cell density="snug" className="text-bark-soft">
                {o.origin}
              </Cell>
            </TableRow>
          );
        })}
      </tbody>
    </Table>
  );
}
