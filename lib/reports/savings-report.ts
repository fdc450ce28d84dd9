// What Kerfwise saved: for each planned job, the timber its plan used against a plain longest-first
// plan of new stock. Rack offcuts the plan used are timber an earlier customer already paid for, not
// a saving: they count at the section's cost per metre, so only better cutting shows as saved.
export type PlannedJobRow = {
  planId: number;
  jobReference: string;
  customerName: string;
  plannedAt: Date;
  stockBoards: number;
  stockCostPence: number;
  /** Rack offcuts the plan used, valued at the section's cost per metre. */
  rackOffcutPence: number;
  baselineBoards: number;
  baselineCostPence: number;
};

export type SavingsLine = PlannedJobRow & {
  savedBoards: number;
  savedPence: number;
  runningSavedPence: number;
};

export type SavingsReport = {
  jobs: SavingsLine[];
  totals: {
    jobs: number;
    stockBoards: number;
    baselineBoards: number;
    savedBoards: number;
    stockCostPence: number;
    rackOffcutPence: number;
    baselineCostPence: number;
    savedPence: number;
  };
};

export function computeSavingsReport({
  plans,
  start,
  end,
}: {
  plans: PlannedJobRow[];
  start: Date;
  end: Date;
}): SavingsReport {
  let running = 0;
  const jobs = plans
    .filter((p) => p.plannedAt >= start && p.plannedAt < end)
    .sort((a, b) => a.plannedAt.getTime() - b.plannedAt.getTime() || a.planId - b.planId)
    .map((p) => {
      const savedPence = p.baselineCostPence - p.stockCostPence - p.rackOffcutPence;
      running += savedPence;
      return { ...p, savedBoards: p.baselineBoards - p.stockBoards, savedPence, runningSavedPence: running };
    });
  const sum = (
    key:
      | 'stockBoards'
      | 'baselineBoards'
      | 'savedBoards'
      | 'stockCostPence'
      | 'rackOffcutPence'
      | 'baselineCostPence'
      | 'savedPence',
  ) => jobs.reduce((n, j) => n + j[key], 0);
  return {
    jobs,
    totals: {
      jobs: jobs.length,
      stockBoards: sum('stockBoards'),
      baselineBoards: sum('baselineBoards'),
      savedBoards: sum('savedBoards'),
      stockCostPence: sum('stockCostPence'),
      rackOffcutPence: sum('rackOffcutPence'),
      baselineCostPence: sum('baselineCostPence'),
      savedPence: sum('savedPence'),
    },
  };
}
