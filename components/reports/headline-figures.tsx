import { Card } from '@/components/ui/field';
import { formatMetres, formatPence } from '@/lib/format/money';
import type { OffcutReport } from '@/lib/reports/offcut-report';
import type { SavingsReport } from '@/lib/reports/savings-report';
import type { WasteReport } from '@/lib/reports/waste-report';

export function HeadlineFigures({
  waste,
  offcuts,
  savings,
}: {
  waste: WasteReport;
  offcuts: OffcutReport;
  savings: SavingsReport;
}) {
  const figures = [
    {
      label: 'Yield',
      value: waste.totals.boards ? `${waste.totals.yieldPercent}%` : '—',
      note: `${waste.totals.boards} boards cut`,
    },
    {
      label: 'Waste',
      value: formatMetres(waste.totals.wasteMm),
      note: `worth ${formatPence(waste.totals.wastePence)}`,
    },
    {
      label: 'Saved by planning',
      value: formatPence(savings.totals.savedPence),
      note: `over ${savings.totals.jobs} jobs against a longest-first plan; rack offcuts count at cost, not as saved`,
    },
    {
      label: 'On the rack',
      value: formatPence(offcuts.totals.rackValuePence),
      note: `${offcuts.totals.rackCount} offcuts, ${formatMetres(offcuts.totals.rackMm)}`,
    },
  ];
  return (
    <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4" data-testid="report-headlines">
      {figures.map((f) => (
        <Card key={f.label}>
          <p className="text-sm font-semibold text-bark-soft">{f.label}</p>
          <p className="mt-1 text-3xl font-bold text-spruce-dark">{f.value}</p>
          <p className="text-sm text-bark-soft">{f.note}</p>
        </Card>
      ))}
    </div>
  );
}
