'use client';

import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatPence } from '@/lib/format/money';
import type { MarginReport } from '@/lib/reports/margin-report';
import { ChartPanel } from './chart-panel';
import { CHART, pounds } from './chart-theme';
import { legendText } from './legend-text';

const money = (v: unknown) => formatPence(Number(v));
const percentText = (v: unknown) => (v === null ? '—' : `${String(v)} %`);

/** Each quoted job: the charge before VAT against what its timber cost the yard. */
export function MarginCharts({ report }: { report: MarginReport }) {
  const t = report.totals;
  const data = report.jobs.map((j) => ({
    ...j,
    netPounds: pounds(j.netPence),
    costPounds: pounds(j.timberCostPence),
  }));
  return (
    <ChartPanel
      id="margin"
      title="Margin on quoted jobs, at cost"
      lead={
        report.jobs.length === 0
          ? undefined
          : `Charged ${formatPence(t.netPence)} before VAT; the timber cost ${formatPence(t.timberCostPence)}: a margin of ${formatPence(t.marginPence)}${t.marginPercent === null ? '' : ` (${t.marginPercent} %)`}.${t.costMissing ? ' Some stock lengths have no cost price yet, so their selling price stands in: enter costs under Stock.' : ''}`
      }
      rows={report.jobs}
      empty={report.jobs.length === 0}
      emptyText="No quoted jobs were planned in this range."
      columns={[
        { key: 'jobReference', label: 'Job' },
        { key: 'customerName', label: 'Customer' },
        { key: 'netPence', label: 'Charged ex VAT', format: money },
        { key: 'timberCostPence', label: 'Timber at cost', format: money },
        { key: 'marginPence', label: 'Margin', format: money },
        { key: 'marginPercent', label: 'Margin %', format: percentText },
        { key: 'costMissing', label: 'Cost price missing', format: (v) => (v ? 'yes' : '') },
      ]}
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data}>
          <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
          <XAxis dataKey="jobReference" fontSize={11} />
          <YAxis fontSize={12} tickFormatter={(v: number) => `£${v}`} />
          <Tooltip />
          <Legend formatter={legendText} />
          <Bar dataKey="netPounds" name="Charged ex VAT (£)" fill={CHART.spruce} />
          <Bar dataKey="costPounds" name="Timber at cost (£)" fill={CHART.grain} />
        </BarChart>
      </ResponsiveContainer>
    </ChartPanel>
  );
}
