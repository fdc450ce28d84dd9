/** Shown by each feature's loading.tsx while a page reads its data. */
export function PageLoading() {
  return (
    <div className="space-y-4 py-6" aria-busy="true" data-testid="page-loading">
      <p className="text-lg font-semibold text-bark-soft">Opening the page…</p>
      <div className="h-8 w-1/3 animate-pulse rounded bg-shaving" />
      <div className="h-40 animate-pulse rounded bg-shaving" />
    </div>
  );
}
