'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import { formatPence } from '@/lib/format/money';
import type { JobPlanRow } from '@/lib/queries/jobs';
import {
  cancelPlanRunRequest,
  createPlanRequest,
  describePlanRun,
  type PlanRunView,
} from '@/lib/queries/plans';

/** Plan the job with the yard's settings, list its plans, and pick two to compare. */
export function JobPlans({
  jobId,
  plans,
  canPlan,
}: {
  jobId: number;
  plans: JobPlanRow[];
  canPlan: boolean;
}) {
  const router = useRouter();
  // Server mode: the queued run being followed, so the page can show its progress and call it off.
  const [run, setRun] = useState<PlanRunView | null>(null);
  const [picked, setPicked] = useState<number[]>([]);
  const planning = useApiMutation({
    mutationFn: () => createPlanRequest(jobId, {}, setRun),
    onSuccess: (created) => router.push(`/plans/${created.id}`),
    onError: () => setRun(null),
  });
  // Busy until the new plan's page opens.
  const busy = planning.isPending || planning.isSuccess;
  const toggle = (id: number) =>
    setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : [...p.slice(-1), id]));

  return (
    <div className="space-y-4">
      {canPlan && (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={() => planning.mutate()} disabled={busy} size="lg">
            {busy ? (run ? describePlanRun(run) : 'Finding the best plan…') : 'Plan this job'}
          </Button>
          {busy && run && (run.status === 'queued' || run.status === 'running') && (
            <Button variant="secondary" onClick={() => void cancelPlanRunRequest(run.runId)}>
              Stop planning
            </Button>
          )}
        </div>
      )}
      {planning.error && <Notice tone="error">{planning.error.message}</Notice>}
      {plans.length > 0 && (
        <Table data-testid="job-plans">
          <TableHead
            density="snug"
            columns={[
              'Compare',
              'Plan',
              'Status',
              { label: 'Boards', numeric: true },
              { label: 'Yield', numeric: true },
              { label: 'Price', numeric: true },
            ]}
          />
          <tbody>
            {plans.map((p) => (
              <TableRow key={p.id}>
                <Cell density="snug">
                  <input
                    type="checkbox"
                    className="h-5 w-5"
                    aria-label={`Compare plan ${p.id}`}
                    checked={picked.includes(p.id)}
                    onChange={() => toggle(p.id)}
                  />
                </Cell>
                <Cell density="snug">
                  <Link className="font-semibold text-spruce underline" href={`/plans/${p.id}`}>
                    Plan {p.id}
                  </Link>{' '}
                  <span className="text-sm text-bark-soft">
                    kerf {p.settings.kerfMm}, trim {p.settings.trimMm}
                    {p.settings.useOffcuts ? '' : ', no offcuts'}
                  </span>
                </Cell>
                <Cell density="snug">{p.status}</Cell>
                <Cell density="snug" numeric>
                  {p.totals.boards}
                </Cell>
                <Cell density="snug" numeric>
                  {p.totals.yieldPercent}%
                </Cell>
                <Cell density="snug" numeric>
                  {formatPence(p.pricePence)}
                </Cell>
              </TableRow>
            ))}
          </tbody>
        </Table>
      )}
      {picked.length === 2 && (
        <Link
          className="inline-block font-semibold text-spruce underline"
          href={`/plans/compare?a=${picked[0]}&b=${picked[1]}`}
        >
          Compare plans {picked[0]} and {picked[1]} side by side
        </Link>
      )}
    </div>
  );
}
