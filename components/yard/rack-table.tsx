'use client';

import type { DisplayUnit } from '@/db/enums';
import { lengthText } from '@/components/stock/stock-length-label';
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
    <table className="w-full text-left text-sm" data-testid="rack-table">
      <thead className="bg-shaving">
        <tr>
          <th className="p-2">
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
          </th>
          {COLUMNS.map(([key, label]) => (
            <th
              key={key}
              className="p-2"
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
            </th>
          ))}
          <th className="p-2">Status</th>
          <th className="p-2">From</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((o) => {
          const age = Math.floor((now - Date.parse(o.createdAt)) / DAY_MS);
          return (
            <tr key={o.id} className="border-t border-shaving" data-testid={`offcut-row-${o.tag}`}>
              <td className="p-2">
                <input
                  type="checkbox"
                  aria-label={`Choose ${o.tag}`}
                  checked={chosen.has(o.id)}
                  onChange={(e) => onChoose([o.id], e.target.checked)}
                />
              </td>
              <td className="p-2 font-mono font-semibold whitespace-nowrap">{o.tag}</td>
              <td className="p-2">{o.sectionName}</td>
              <td className="p-2 whitespace-nowrap">{lengthText(o.lengthMm, unit)}</td>
              <td className="p-2">
                <OffcutLocationCell offcut={o} canEdit={canEdit} onError={onError} />
              </td>
              <td className="p-2 whitespace-nowrap">
                {age} d
                {age >= clearAfterDays && (o.status === 'available' || o.status === 'reserved') && (
                  <span className="ml-2 rounded bg-amber-light px-1.5 py-0.5 text-xs font-semibold">
                    clear?
                  </span>
                )}
              </td>
              <td className="p-2">
                {o.status}
                {o.scrapReason ? ` — ${o.scrapReason}` : ''}
              </td>
              <td className="p-2 text-bark-soft">{o.origin}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
