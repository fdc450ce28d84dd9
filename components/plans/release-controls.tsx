'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/queries/fetch-json';
import { StockShortfalls } from './stock-shortfalls';
import {
  createPlanRequest,
  releasePlanRequest,
  unreleasePlanRequest,
  type PlanViewData,
} from '@/lib/queries/plans';
import { jobKeys, planKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { ReleasePlanBodyInput } from '@/lib/validations/quotes';

type Taken = { id: number; tag: string; status: string };
type Refusal = { offcuts?: Taken[]; missing?: string; reason?: string };
type ReleaseChange = { kind: 'release'; body?: ReleasePlanBodyInput } | { kind: 'unrelease' };

/** Release to the saw, or take back. A release that lost an offcut names it and offers a fresh plan. */
export function ReleaseControls({ plan, isOwner }: { plan: PlanViewData; isOwner: boolean }) {
  const router = useRouter();
  const [reason, setReason] = useState('');
  const change = useApiMutation({
    mutationFn: (c: ReleaseChange): Promise<unknown> =>
      c.kind === 'release' ? releasePlanRequest(plan.id, c.body) : unreleasePlanRequest(plan.id),
    invalidates: [planKeys.detail(plan.id), jobKeys.detail(plan.jobId)],
    onSuccess: () => router.refresh(),
  });
  const replan = useApiMutation({
    mutationFn: () => {
      const { stockLengthIds, kerfMm, trimMm, minOffcutMm, useOffcuts, timeLimitMs } = plan.settings;
      return createPlanRequest(plan.jobId, {
        stockLengthIds,
        kerfMm,
        trimMm,
        minOffcutMm,
        useOffcuts,
        timeLimitMs,
      });
    },
    onSuccess: (next) => router.push(`/plans/${next.id}`),
  });
  // Busy until a new plan's page opens.
  const busy = change.isPending || replan.isPending || replan.isSuccess;
  const error = replan.error?.message ?? change.error?.message;
  // A 409 says why the plan cannot go to the saw yet.
  const refusal =
    change.error instanceof ApiError && change.error.status === 409
      ? (change.error.body as { details?: Refusal } | null)?.details
      : undefined;
  const taken = refusal?.offcuts ?? [];
  const needsPayment = Boolean(refusal?.missing);
  // The stock count cannot cover the plan: the yard hand confirms before it goes to the saw.
  const stockShort = refusal?.reason === 'stock_short';
  const act = (c: ReleaseChange) => {
    replan.reset();
    change.mutate(c);
  };
  const release = (body?: ReleasePlanBodyInput) => act({ kind: 'release', body });

  return (
    <div className="space-y-3" data-testid="release-controls">
      {plan.status === 'planned' && <StockShortfalls planId={plan.id} />}
      <div className="flex flex-wrap gap-2">
        {plan.status === 'planned' && (
          <Button size="lg" disabled={busy} onClick={() => release()}>
            Release to the saw
          </Button>
        )}
        {plan.status === 'released' && (
          <Button variant="secondary" disabled={busy} onClick={() => act({ kind: 'unrelease' })}>
            Take back from the saw
          </Button>
        )}
      </div>
      {plan.status === 'released' && (
        <Notice>
          Released to the saw
          {plan.releasedAt ? ` on ${new Date(plan.releasedAt).toLocaleString('en-GB')}` : ''}. Its offcuts are
          reserved.
        </Notice>
      )}
      {plan.status === 'superseded' && (
        <Notice tone="warning">
          This plan was replaced by another plan of the job, or its cut list changed. Plan the job again to
          release it.
        </Notice>
      )}
      {error && (
        <Notice tone="error" data-testid="release-error">
          <p>{error}</p>
          {taken.length > 0 && (
            <>
              <p className="mt-1">
                Taken from the rack since this plan was made:{' '}
                {taken.map((o) => `${o.tag} (${o.status})`).join(', ')}.
              </p>
              <Button className="mt-2" variant="secondary" disabled={busy} onClick={() => replan.mutate()}>
                Plan again with what is on the rack now
              </Button>
            </>
          )}
          {stockShort && (
            <Button
              className="mt-2"
              variant="secondary"
              disabled={busy}
              onClick={() => release({ confirmShortfall: true })}
              data-testid="confirm-shortfall"
            >
              The boards are in the yard: release anyway
            </Button>
          )}
          {needsPayment && isOwner && (
            <form
              className="mt-3 flex flex-wrap items-end gap-2"
              onSubmit={(e) => {
                e.preventDefault();
                release({ override: reason });
              }}
            >
              <label className="flex min-w-64 flex-1 flex-col text-sm font-semibold text-bark">
                Owner override: reason (recorded)
                <input
                  className="mt-1 rounded border border-bark-soft px-2 py-1.5 font-normal"
                  value={reason}
                  onChange={(e) => setReason(e.target.value)}
                  minLength={3}
                  required
                  data-testid="override-reason"
                />
              </label>
              <Button type="submit" variant="secondary" disabled={busy}>
                Release anyway
              </Button>
            </form>
          )}
        </Notice>
      )}
    </div>
  );
}
