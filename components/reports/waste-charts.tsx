'use client';

import {
  Bar,
  BarChart,
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { formatMetres, formatPence } from '@/lib/format/money';
import type { WasteReport } from '@/lib/reports/waste-report';
import { ChartPanel } from './chart-panel';
import { legendText } from './legend-text';
import { CHART, metres, shortWeek } from './chart-theme';

const NOTHING_CUT =
  'The saw finished no boards in this range. Choose a wider range, or come back once jobs are cut.';

export function WasteCharts({ report }: { report: WasteReport }) {
  // Weeks with nothing cut have no yield: a gap in the line, not a drop to zero.
  const weekly = report.weekly.map((w) => ({
    ...w,
    label: shortWeek(w.week),
    wasteM: metres(w.wasteMm),
    yieldPercent: w.boards ? w.yieldPercent : null,
  }));
  const sections = report.bySection.map((s) => ({ ...s, wasteM: metres(s.wasteMm) }));
  const flows = report.cutVersusBought.map((f) => ({
    ...f,
    label: shortWeek(f.week),
    cutM: metres(f.cutMm),
    boughtM: metres(f.boughtMm),
  }));
  const mm = (v: unknown) => formatMetres(Number(v));
  const money = (v: unknown) => formatPence(Number(v));
  return (
    <div className="grid gap-4 xl:grid-cols-2">
      <ChartPanel
        id="waste-weekly"
        title="Waste and yield by week"
        lead="Waste = trim + saw kerfs + remainders too short to keep."
        rows={report.weekly}
        empty={report.totals.boards === 0}
        emptyText={NOTHING_CUT}
        columns={[
          { key: 'week', label: 'Week from' },
          { key: 'boards', label: 'Boards' },
          { key: 'materialMm', label: 'Material mm', format: mm },
          { key: 'wasteMm', label: 'Waste mm', format: mm },
          { key: 'wastePence', label: 'Waste value', format: money },
          { key: 'yieldPercent', label: 'Yield %' },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={weekly}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis dataKey="label" fontSize={12} />
            <YAxis yAxisId="m" fontSize={12} unit=" m" />
            <YAxis
              yAxisId="pct"
              orientation="right"
              fontSize={12}
              unit="%"
              domain={[80, 100]}
              allowDataOverflow
            />
            <Tooltip />
            <Legend formatter={legendText} />
            <Bar yAxisId="m" dataKey="wasteM" name="Waste (m)" fill={CHART.amber} />
            <Line
              yAxisId="pct"
              dataKey="yieldPercent"
              name="Yield %"
              stroke={CHART.spruce}
              strokeWidth={2}
              dot={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </ChartPanel>
      <ChartPanel
        id="waste-by-section"
        title="Waste by section"
        rows={report.bySection}
        empty={report.totals.boards === 0}
        emptyText={NOTHING_CUT}
        columns={[
          { key: 'sectionName', label: 'Section' },
          { key: 'boards', label: 'Boards' },
          { key: 'wasteMm', label: 'Waste mm', format: mm },
          { key: 'wastePence', label: 'Waste value', format: money },
          { key: 'yieldPercent', label: 'Yield %' },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={sections} layout="vertical" margin={{ left: 40 }}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis type="number" fontSize={12} unit=" m" />
            <YAxis type="category" dataKey="sectionName" width={150} fontSize={11} />
            <Tooltip />
            <Bar dataKey="wasteM" name="Waste (m)" fill={CHART.amber} />
          </BarChart>
        </ResponsiveContainer>
      </ChartPanel>
      <ChartPanel
        id="cut-versus-bought"
        title="Material cut against material bought"
        lead={`Cut ${formatMetres(report.totals.cutMm)} of new stock (${formatPence(report.totals.cutPence)}); bought ${formatMetres(report.totals.boughtMm)} (${formatPence(report.totals.boughtPence)}).`}
        rows={report.cutVersusBought}
        empty={report.totals.cutMm === 0 && report.totals.boughtMm === 0}
        emptyText="No stock was cut or delivered in this range."
        columns={[
          { key: 'week', label: 'Week from' },
          { key: 'cutMm', label: 'Cut mm', format: mm },
          { key: 'cutPence', label: 'Cut value', format: money },
          { key: 'boughtMm', label: 'Bought mm', format: mm },
          { key: 'boughtPence', label: 'Bought value', format: money },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={flows}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis dataKey="label" fontSize={12} />
            <YAxis fontSize={12} unit=" m" />
            <Tooltip />
            <Legend formatter={legendText} />
            <Bar dataKey="cutM" name="Cut (m)" fill={CHART.spruce} />
            <Bar dataKey="boughtM" name="Bought (m)" fill={CHART.grain} />
          </BarChart>
        </ResponsiveContainer>
      </ChartPanel>
    </div>
  );
}
