import type { Metadata } from 'next';
import { Suspense } from 'react';
import { HeadlineFigures } from '@/components/reports/headline-figures';
import { MarginCharts } from '@/components/reports/margin-charts';
import { OffcutCharts } from '@/components/reports/offcut-charts';
import { ReportRangeForm } from '@/components/reports/report-range-form';
import { ReportSkeleton } from '@/components/reports/report-skeleton';
import { SavingsCharts } from '@/components/reports/savings-charts';
import { StockReportView } from '@/components/reports/stock-report-view';
import { WasteCharts } from '@/components/reports/waste-charts';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { getOffcutReport, getSavingsReport, getStockReport, getWasteReport } from '@/lib/reports/get-reports';
import { getMarginReport } from '@/lib/reports/get-margin-report';
import { readReportRange } from '@/lib/reports/report-range';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export const metadata: Metadata = { title: 'Reports' };

type Reports = {
  waste: ReturnType<typeof getWasteReport>;
  offcuts: ReturnType<typeof getOffcutReport>;
  savings: ReturnType<typeof getSavingsReport>;
  stock: ReturnType<typeof getStockReport>;
  margin: ReturnType<typeof getMarginReport>;
};

export default async function ReportsPage({
  searchParams,
}: {
  searchParams: Promise<{ from?: string; to?: string }>;
}) {
  await requirePageUser('reports:read');
  const { range, problem } = readReportRange(await searchParams);
  // Started together, shown as each arrives: every report streams in its own Suspense boundary.
  const reports: Reports = {
    waste: started(getWasteReport(range)),
    offcuts: started(getOffcutReport(range)),
    savings: started(getSavingsReport(range)),
    stock: started(getStockReport(range)),
    margin: started(getMarginReport(range)),
  };
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
        <Suspense fallback={<ReportSkeleton />}>
          <Headline reports={reports} />
        </Suspense>
        <ReportSection title="Waste and yield">
          <Waste reports={reports} />
        </ReportSection>
        <ReportSection title="Offcuts">
          <Offcuts reports={reports} />
        </ReportSection>
        <ReportSection title="Savings">
          <Savings reports={reports} />
        </ReportSection>
        <ReportSection title="Margin">
          <Margin reports={reports} />
        </ReportSection>
        <ReportSection title="Stock">
          <Stock reports={reports} />
        </ReportSection>
      </div>
    </>
  );
}

/** A read started now and awaited later by its section: a failure reaches that section's error page
 *  then, and is never reported as unhandled before the section awaits it. */
function started<T>(read: Promise<T>): Promise<T> {
  read.catch(() => undefined);
  return read;
}

function ReportSection({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="space-y-3">
      <h2 className="text-2xl font-bold">{title}</h2>
      <Suspense fallback={<ReportSkeleton />}>{children}</Suspense>
    </section>
  );
}

async function Headline({ reports }: { reports: Reports }) {
  const [waste, offcuts, savings] = await Promise.all([reports.waste, reports.offcuts, reports.savings]);
  return <HeadlineFigures waste={waste} offcuts={offcuts} savings={savings} />;
}

async function Waste({ reports }: { reports: Reports }) {
  return <WasteCharts report={await reports.waste} />;
}

async function Offcuts({ reports }: { reports: Reports }) {
  const [report, settings] = await Promise.all([reports.offcuts, getYardSettings()]);
  return <OffcutCharts report={report} clearAfterDays={settings.clearOffcutsAfterDays} />;
}

async function Savings({ reports }: { reports: Reports }) {
  return <SavingsCharts report={await reports.savings} />;
}

async function Margin({ reports }: { reports: Reports }) {
  return <MarginCharts report={await reports.margin} />;
}

async function Stock({ reports }: { reports: Reports }) {
  return <StockReportView report={await reports.stock} />;
}
