'use client';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/field';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { Cell, HeadCell, Table, TableHead, TableRow } from '@/components/ui/table';
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
              <Table className="text-sm">
                <TableHead density="compact" className="sticky top-0">
                  {columns.map((c) => (
                    <HeadCell key={c.key} density="compact">
                      {c.label}
                    </HeadCell>
                  ))}
                </TableHead>
                <tbody>
                  {rows.map((r, i) => (
                    <TableRow key={i}>
                      {columns.map((c) => (
                        <Cell key={c.key} density="compact">
                          {c.format ? c.format(r[c.key], r) : String(r[c.key])}
                        </Cell>
                      ))}
                    </TableRow>
                  ))}
                </tbody>
              </Table>
            </ScrollRegion>
          </details>
        </>
      )}
    </Card>
  );
}
