'use client';

import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { StockReport } from '@/lib/reports/stock-report';
import { ChartPanel } from './chart-panel';
import { legendText } from './legend-text';
import { CHART } from './chart-theme';

export function StockReportView({ report }: { report: StockReport }) {
  const counted = report.lines.filter((l) => l.onHand !== null);
  // The chart shows the busiest counted lengths (and every short one); the table lists them all.
  const CHART_LENGTHS = 14;
  const data = [...counted]
    .sort((a, b) => Number(b.short) - Number(a.short) || b.used - a.used)
    .slice(0, CHART_LENGTHS)
    .map((l) => ({ ...l, label: `${l.sectionName.split(' ')[0]} ${l.lengthMm}` }));
  return (
    <div className="space-y-4">
      {report.short.length > 0 ? (
        <div
          className="rounded-lg border-l-4 border-amber bg-amber-light px-4 py-3"
          data-testid="short-lengths"
        >
          <p className="font-semibold">
            Running short (under three weeks of cover at this range’s rate, or none left):
          </p>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {report.short.map((l) => (
              <li key={l.stockLengthId}>
                {l.sectionName}, {l.lengthMm} mm: {l.onHand} on hand, {l.usedPerWeek} a week
                {l.weeksOfCover !== null ? ` — about ${l.weeksOfCover} weeks left` : ''}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p className="rounded-lg bg-spruce-light px-4 py-3">
          No counted length runs short at this range’s rate of use.
        </p>
      )}
      <ChartPanel
        id="stock-on-hand"
        title="On hand against use"
        lead={`Boards on hand now against boards cut in the ${report.weeks} weeks of the range, for the ${CHART_LENGTHS} busiest counted lengths; the figures list every length.`}
        rows={report.lines}
        empty={counted.length === 0}
        emptyText="No stock length is counted yet: take stock to start counting."
        columns={[
          { key: 'sectionName', label: 'Section' },
          { key: 'lengthMm', label: 'Length mm' },
          { key: 'onHand', label: 'On hand', format: (v) => (v === null ? 'unlimited' : String(v)) },
          { key: 'used', label: 'Cut in range' },
          { key: 'usedPerWeek', label: 'Per week' },
          { key: 'weeksOfCover', label: 'Weeks of cover', format: (v) => (v === null ? '—' : String(v)) },
          { key: 'short', label: 'Short', format: (v) => (v ? 'yes' : '') },
        ]}
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data}>
            <CartesianGrid stroke={CHART.grain} strokeDasharray="3 3" />
            <XAxis dataKey="label" fontSize={10} interval={0} angle={-40} textAnchor="end" height={60} />
            <YAxis fontSize={12} allowDecimals={false} />
            <Tooltip />
            <Legend verticalAlign="top" formatter={legendText} />
            <Bar dataKey="onHand" name="On hand" fill={CHART.spruce} />
            <Bar dataKey="used" name="Cut in range" fill={CHART.amber} />
          </BarChart>
        </ResponsiveContainer>
      </ChartPanel>
    </div>
  );
}
