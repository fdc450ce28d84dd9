'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card, cardClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { DisplayUnit } from '@/db/enums';
import { offcutsQuery, rackQueryString, type RackFilters } from '@/lib/queries/offcuts';
import { RackFiltersBar } from './rack-filters';
import { RackImport } from './rack-import';
import { RackTable } from './rack-table';
import { ChosenOffcutsBar } from './chosen-offcuts-bar';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { cn } from '@/lib/cn';

const START: RackFilters = {
  q: '',
  sectionId: '',
  minLengthMm: '',
  maxLengthMm: '',
  location: '',
  minAgeDays: '',
  status: 'on_rack',
  sort: 'age',
  dir: 'desc',
  page: '1',
};

type Props = {
  unit: DisplayUnit;
  clearAfterDays: number;
  canEdit: boolean;
  sections: { id: number; name: string }[];
  initial?: Partial<RackFilters>;
};

export function RackManager({ unit, clearAfterDays, canEdit, sections, initial }: Props) {
  const [filters, setFilters] = useState<RackFilters>({ ...START, ...initial });
  const [now] = useState(() => Date.now());
  const [chosen, setChosen] = useState<Set<number>>(new Set());
  const [message, setMessage] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const rack = useQuery(offcutsQuery(filters));
  const change = (c: Partial<RackFilters>) => setFilters((f) => ({ ...f, ...c }));
  const choose = (ids: number[], on: boolean) =>
    setChosen((s) => {
      const next = new Set(s);
      ids.forEach((id) => (on ? next.add(id) : next.delete(id)));
      return next;
    });
  const page = Number(filters.page);
  const data = rack.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const exportFilters = { ...filters, page: '' };

  return (
    <div className="space-y-4">
      <Card>
        <RackFiltersBar
          filters={filters}
          onChange={change}
          sections={sections}
          locations={data?.locations ?? []}
          clearAfterDays={clearAfterDays}
        />
      </Card>
      {chosen.size > 0 && (
        <ChosenOffcutsBar
          ids={[...chosen]}
          canEdit={canEdit}
          locations={data?.locations ?? []}
          onError={setError}
          onDone={(m) => {
            setMessage(m);
            setChosen(new Set());
          }}
        />
      )}
      {message && <Notice data-testid="rack-message">{message}</Notice>}
      {error && <Notice tone="error">{error}</Notice>}
      {rack.error && <Notice tone="error">{rack.error.message}</Notice>}
      <ScrollRegion label="Offcuts on the rack" className={cn(cardClass, 'p-0')}>
        {data && data.total === 0 ? (
          <p className="p-6 text-center text-bark-soft" data-testid="rack-empty">
            No offcuts match these filters.
          </p>
        ) : (
          data && (
            <RackTable
              rows={data.offcuts}
              unit={unit}
              clearAfterDays={clearAfterDays}
              canEdit={canEdit}
              chosen={chosen}
              onChoose={choose}
              filters={filters}
              onSort={(sort, dir) => change({ sort, dir, page: '1' })}
              onError={setError}
              now={now}
            />
          )
        )}
        {rack.isPending && <p className="p-4">Loading the rack…</p>}
      </ScrollRegion>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm" data-testid="rack-count">
          {data
            ? `${data.total === 0 ? 0 : (page - 1) * data.pageSize + 1}–${Math.min(page * data.pageSize, data.total)} of ${data.total} offcuts`
            : ''}
        </p>
        <div className="flex items-center gap-2">
          <Button variant="secondary" disabled={page <= 1} onClick={() => change({ page: String(page - 1) })}>
            Previous
          </Button>
          <span className="text-sm">
            Page {page} of {pages}
          </span>
          <Button
            variant="secondary"
            disabled={page >= pages}
            onClick={() => change({ page: String(page + 1) })}
          >
            Next
          </Button>
          <a
            className="inline-flex min-h-11 items-center rounded-lg px-3 font-semibold text-spruce underline"
            href={`/api/offcuts/export?${rackQueryString(exportFilters)}`}
            download
          >
            Export CSV
          </a>
        </div>
      </div>
      {canEdit && (
        <details className="rounded-xl border-2 border-shaving bg-white p-4">
          <summary className="cursor-pointer font-semibold">Import an existing rack from CSV</summary>
          <div className="mt-3">
            <RackImport />
          </div>
        </details>
      )}
    </div>
  );
}
