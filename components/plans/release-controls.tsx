'use client';

import { useQueryClient } from '@tanstack/react-query';
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

type Taken = { id: number; tag: string; status: string };

/** Release to the saw, or take back. A release that lost an offcut names it and offers a fresh plan. */
export function ReleaseControls({ plan, isOwner }: { plan: PlanViewData; isOwner: boolean }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [taken, setTaken] = useState<Taken[]>([]);
  const [needsPayment, setNeedsPayment] = useState(false);
  const [reason, setReason] = useState('');
  // The stock count cannot cover the plan: the yard hand confirms before it goes to the saw.
  const [stockShort, setStockShort] = useState(false);

  async function act(request: () => Promise<unknown>) {
    setBusy(true);
    setError(null);
    setTaken([]);
    setNeedsPayment(false);
    setStockShort(false);
    try {
      await request();
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: planKeys.detail(plan.id) }),
        queryClient.invalidateQueries({ queryKey: jobKeys.detail(plan.jobId) }),
      ]);
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
      if (e instanceof ApiError && e.status === 409) {
        const details = (e.body as { details?: { offcuts?: Taken[]; missing?: string; reason?: string } })
          ?.details;
        setTaken(details?.offcuts ?? []);
        setNeedsPayment(Boolean(details?.missing));
        setStockShort(details?.reason === 'stock_short');
      }
    } finally {
      setBusy(false);
    }
  }

  async function replan() {
    setBusy(true);
    try {
      const { stockLengthIds, kerfMm, trimMm, minOffcutMm, useOffcuts, timeLimitMs } = plan.settings;
      const next = await createPlanRequest(plan.jobId, {
        stockLengthIds,
        kerfMm,
        trimMm,
        minOffcutMm,
        useOffcuts,
        timeLimitMs,
      });
      router.push(`/plans/${next.id}`);
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  }

  return (
    <div className="space-y-3" data-testid="release-controls">
      {plan.status === 'planned' && <StockShortfalls planId={plan.id} />}
      <div className="flex flex-wrap gap-2">
        {plan.status === 'planned' && (
          <Button size="lg" disabled={busy} onClick={() => act(() => releasePlanRequest(plan.id))}>
            Release to the saw
          </Button>
        )}
        {plan.status === 'released' && (
          <Button
            variant="secondary"
            disabled={busy}
            onClick={() => act(() => unreleasePlanRequest(plan.id))}
          >
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
              <Button className="mt-2" variant="secondary" disabled={busy} onClick={replan}>
                Plan again with what is on the rack now
              </Button>
            </>
          )}
          {stockShort && (
            <Button
              className="mt-2"
              variant="secondary"
              disabled={busy}
              onClick={() => act(() => releasePlanRequest(plan.id, { confirmShortfall: true }))}
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
                void act(() => releasePlanRequest(plan.id, { override: reason }));
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
