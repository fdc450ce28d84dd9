'use client';

import {
  Bar,
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { formatPence } from '@/lib/format/money';
import type { SavingsReport } from '@/lib/reports/savings-report';
import { ChartPanel } from './chart-panel';
import { legendText } from './legend-text';
import { CHART, pounds } from './chart-theme';

export function SavingsCharts({ report }: { report: SavingsReport }) {
  const data = report.jobs.map((j) => ({
    ...j,
    plainPounds: pounds(j.baselineCostPence),
    kerfwisePounds: pounds(j.stockCostPence),
    runningPounds: pounds(j.runningSavedPence),
  }));
  const money = (v: unknown) => formatPence(Number(v));
  const t = report.totals;
  return (
    <ChartPanel
      id="savings"
      title="What planning saved, job by job"
      lead={
        t.jobs === 0
          ? undefined
          : `Across ${t.jobs} planned jobs a plain longest-first plan would have used ${t.baselineBoards} new boards (${formatPence(t.baselineCostPence)}); Kerfwise used ${t.stockBoards} (${formatPence(t.stockCostPence)}): ${t.savedBoards} boards and ${formatPence(t.savedPence)} saved.`
      }
      rows={report.jobs}
      empty={t.jobs === 0}
      emptyText="No jobs were planned in this range, so there is nothing to compare yet."
      columns={[
        { key: 'jobReference', label: 'Job' },
        { key: 'customerName', label: 'Customer' },
        {
          key: 'plannedAt',
          label: 'Planned',
          format: (v) => new Date(v as unknown as string).toLocaleDateString('en-GB'),
        },
        { key: 'baselineBoards', label: 'Longest-first boards' },
        { key: 'stockBoards', label: 'Kerfwise boards' },
        { key: 'baselineCostPence', label: 'Longest-first cost', format: money },
        { key: 'stockCostPence', label: 'Kerfwise cost', format: money },
        { key: 'savedPence', label: 'Saved', format: money },
        { key: 'runningSavedPence', label: 'Running total', format: money },
      ]}
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={data}>
          <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
          <XAxis dataKey="jobReference" fontSize={11} />
          <YAxis yAxisId="job" fontSize={12} tickFormatter={poundsTick} />
          <YAxis yAxisId="run" orientation="right" fontSize={12} tickFormatter={poundsTick} />
          <Tooltip />
          <Legend formatter={legendText} />
          <Bar yAxisId="job" dataKey="plainPounds" name="Longest-first (£)" fill={CHART.grain} />
          <Bar yAxisId="job" dataKey="kerfwisePounds" name="Kerfwise (£)" fill={CHART.spruce} />
          <Line
            yAxisId="run"
            dataKey="runningPounds"
            name="Saved so far (£)"
            stroke={CHART.amber}
            strokeWidth={2}
            dot={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </ChartPanel>
  );
}

/** Money on an axis the way it is written: £100, not 100 £. */
const poundsTick = (value: number) => `£${value}`;
