/** Stands in for one report while it is read. */
export function ReportSkeleton() {
  return (
    <div className="h-64 animate-pulse rounded-lg bg-shaving" aria-busy="true" data-testid="report-loading">
      <span className="sr-only">Reading this report…</span>
    </div>
  );
}
