import type { Metadata } from 'next';
import { HeadlineFigures } from '@/components/reports/headline-figures';
import { OffcutCharts } from '@/components/reports/offcut-charts';
import { ReportRangeForm } from '@/components/reports/report-range-form';
import { SavingsCharts } from '@/components/reports/savings-charts';
import { StockReportView } from '@/components/reports/stock-report-view';
import { WasteCharts } from '@/components/reports/waste-charts';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getOffcutReport, getSavingsReport, getStockReport, getWasteReport } from '@/lib/reports/get-reports';
import { readReportRange } from '@/lib/reports/report-range';
import { getYardSettings } from '@/lib/yard/yard-settings';

export const metadata: Metadata = { title: 'Reports' };

export default async function ReportsPage({
  searchParams,
}: {
  searchParams: Promise<{ from?: string; to?: string }>;
}) {
  await requirePageUser('reports:read');
  const { range, problem } = readReportRange(await searchParams);
  const [waste, offcuts, savings, stock, settings] = await Promise.all([
    getWasteReport(range),
    getOffcutReport(range),
    getSavingsReport(range),
    getStockReport(range),
    getYardSettings(),
  ]);
  const today = readReportRange({}).range.to;
  return (
    <>
      <PageHeader
        title="Reports"
        lead="What the yard's cutting really costs: waste, the offcut rack, what planning saved, and stock against use."
      />
      <div className="space-y-8">
        <ReportRangeForm range={range} today={today} />
        {problem && <Notice tone="warning">{problem}</Notice>}
        <HeadlineFigures waste={waste} offcuts={offcuts} savings={savings} />
        <section className="space-y-3">
          <h2 className="text-2xl font-bold">Waste and yield</h2>
          <WasteCharts report={waste} />
        </section>
        <section className="space-y-3">
          <h2 className="text-2xl font-bold">Offcuts</h2>
          <OffcutCharts report={offcuts} clearAfterDays={settings.clearOffcutsAfterDays} />
        </section>
        <section className="space-y-3">
          <h2 className="text-2xl font-bold">Savings</h2>
          <SavingsCharts report={savings} />
        </section>
        <section className="space-y-3">
          <h2 className="text-2xl font-bold">Stock</h2>
          <StockReportView report={stock} />
        </section>
      </div>
    </>
  );
}
