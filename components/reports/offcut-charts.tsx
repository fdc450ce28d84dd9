'use client';

import Link from 'next/link';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatMetres, formatPence } from '@/lib/format/money';
import type { OffcutReport } from '@/lib/reports/offcut-report';
import { ChartPanel } from './chart-panel';
import { legendText } from './legend-text';
import { CHART, metres, shortWeek } from './chart-theme';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';

export function OffcutCharts({ report, clearAfterDays }: { report: OffcutReport; clearAfterDays: number }) {
  const weekly = report.weekly.map((w) => ({ ...w, label: shortWeek(w.week) }));
  const bySection = report.rackBySection.map((s) => ({ ...s, lengthM: metres(s.lengthMm) }));
  const mm = (v: unknown) => formatMetres(Number(v));
  const money = (v: unknown) => formatPence(Number(v));
  const rackEmpty = report.totals.rackCount === 0;
  return (
    <div className="grid gap-4 xl:grid-cols-2">
      <ChartPanel
        id="offcuts-weekly"
        title="Offcuts made and used each week"
        lead={`${report.totals.made} made, ${report.totals.used} used, ${report.totals.scrapped} scrapped in this range.`}
        rows={report.weekly}
        empty={report.totals.made + report.totals.used + report.totals.scrapped === 0}
        emptyText="No offcuts were made, used or scrapped in this range."
        columns={[
          { key: 'week', label: 'Week from' },
          { key: 'madeCount', label: 'Made' },
          { key: 'madeMm', label: 'Made mm', format: mm },
          { key: 'usedCount', label: 'Used' },
          { key: 'usedMm', label: 'Used mm', format: mm },
          { key: 'scrappedCount', label: 'Scrapped' },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={weekly}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis dataKey="label" fontSize={12} />
            <YAxis fontSize={12} allowDecimals={false} />
            <Tooltip />
            <Legend formatter={legendText} />
            <Bar dataKey="madeCount" name="Made" fill={CHART.spruceSoft} />
            <Bar dataKey="usedCount" name="Used" fill={CHART.spruce} />
            <Bar dataKey="scrappedCount" name="Scrapped" fill={CHART.brick} />
          </BarChart>
        </ResponsiveContainer>
      </ChartPanel>
      <ChartPanel
        id="rack-by-section"
        title="On the rack now, by section"
        lead={`${report.totals.rackCount} offcuts, ${formatMetres(report.totals.rackMm)}, worth ${formatPence(report.totals.rackValuePence)} at stock prices.`}
        rows={report.rackBySection}
        empty={rackEmpty}
        emptyText="The rack is empty."
        columns={[
          { key: 'sectionName', label: 'Section' },
          { key: 'count', label: 'Offcuts' },
          { key: 'lengthMm', label: 'Length', format: mm },
          { key: 'valuePence', label: 'Value', format: money },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={bySection} layout="vertical" margin={{ left: 40 }}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis type="number" fontSize={12} unit=" m" />
            <YAxis type="category" dataKey="sectionName" width={150} fontSize={11} />
            <Tooltip />
            <Bar dataKey="lengthM" name="Rack length (m)" fill={CHART.spruce} />
          </BarChart>
        </ResponsiveContainer>
      </ChartPanel>
      <ChartPanel
        id="rack-age"
        title="How long offcuts have sat on the rack"
        rows={report.ageHistogram}
        empty={rackEmpty}
        emptyText="The rack is empty."
        columns={[
          { key: 'label', label: 'Age' },
          { key: 'count', label: 'Offcuts' },
          { key: 'lengthMm', label: 'Length', format: mm },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={report.ageHistogram}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis dataKey="label" fontSize={12} />
            <YAxis fontSize={12} allowDecimals={false} />
            <Tooltip />
            <Bar dataKey="count" name="Offcuts" fill={CHART.amber} />
          </BarChart>
        </ResponsiveContainer>
      </ChartPanel>
      <OldestOffcuts report={report} clearAfterDays={clearAfterDays} />
    </div>
  );
}

function OldestOffcuts({ report, clearAfterDays }: { report: OffcutReport; clearAfterDays: number }) {
  return (
    <div
      className="rounded-xl border-2 border-shaving bg-white p-5 shadow-sm"
      data-testid="report-oldest-offcuts"
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 className="text-lg font-bold">Oldest offcuts</h3>
        <Link className="font-semibold text-spruce underline" href={`/rack?minAgeDays=${clearAfterDays}`}>
          Clear old offcuts on the rack
        </Link>
      </div>
      {report.oldest.length === 0 ? (
        <p className="mt-3 rounded-lg bg-shaving p-6 text-center text-bark-soft">The rack is empty.</p>
      ) : (
        <Table className="mt-3 text-sm">
          <TableHead density="compact" columns={['Tag', 'Section', 'Length', 'Where', 'Age']} />
          <tbody>
            {report.oldest.map((o) => (
              <TableRow key={o.id}>
                <Cell density="compact" className="font-mono">
                  {o.tag}
                </Cell>
                <Cell density="compact">{o.sectionName}</Cell>
                <Cell density="compact">{o.lengthMm} mm</Cell>
                <Cell density="compact">{o.location}</Cell>
                <Cell density="compact">
                  {o.ageDays} days
                  {o.clearSuggested && (
                    <span className="ml-1 rounded bg-amber-light px-1 text-xs font-semibold">clear?</span>
                  )}
                </Cell>
              </TableRow>
            ))}
          </tbody>
        </Table>
      )}
    </div>
  );
}
