'use client';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/field';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { downloadCsv, rowsToCsv, type Column } from './csv-download';

type Props<T> = {
  id: string;
  title: string;
  lead?: string;
  rows: T[];
  columns: Column<T>[];
  /** True when the range holds nothing to draw. */
  empty: boolean;
  emptyText: string;
  children: React.ReactNode;
};

/** One report chart with its figures as a table and a CSV download beside it. */
export function ChartPanel<T>({ id, title, lead, rows, columns, empty, emptyText, children }: Props<T>) {
  return (
    <Card className="space-y-3" data-testid={`report-${id}`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 className="text-lg font-bold">{title}</h3>
          {lead && <p className="text-sm text-bark-soft">{lead}</p>}
        </div>
        {!empty && (
          <Button variant="secondary" onClick={() => downloadCsv(`${id}.csv`, rowsToCsv(rows, columns))}>
            Download CSV
          </Button>
        )}
      </div>
      {empty ? (
        <p
          className="rounded-lg bg-shaving p-6 text-center text-bark-soft"
          data-testid={`report-${id}-empty`}
        >
          {emptyText}
        </p>
      ) : (
        <>
          <div className="h-64 w-full">{children}</div>
          <details>
            <summary className="cursor-pointer text-sm font-semibold text-spruce">Show the figures</summary>
            <ScrollRegion label={`${title}: the figures`} className="mt-2 max-h-80">
              <table className="w-full text-left text-sm">
                <thead className="sticky top-0 bg-shaving">
                  <tr>
                    {columns.map((c) => (
                      <th key={c.key} className="p-1.5">
                        {c.label}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {rows.map((r, i) => (
                    <tr key={i} className="border-t border-shaving">
                      {columns.map((c) => (
                        <td key={c.key} className="p-1.5">
                          {c.format ? c.format(r[c.key], r) : String(r[c.key])}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </ScrollRegion>
          </details>
        </>
      )}
    </Card>
  );
}
