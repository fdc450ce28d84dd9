import { queryOptions } from '@tanstack/react-query';
import type { BoardStatus, PlanStatus } from '@/db/enums';
import type { CuttingPlanPrice } from '@/lib/pricing/pricing-types';
import type { BoardPiece, PlanSection, PlanSettings, PlanTotals } from '@/lib/plans/plan-shapes';
import type { QuoteView } from '@/lib/quotes/get-plan-quote';
import type { PaymentState } from '@/lib/quotes/payment-state';
import type { ReleasePlanBodyInput } from '@/lib/validations/quotes';
import { fetchJson } from './fetch-json';
import { planKeys } from './query-keys';

export type PlanBoardView = {
  id: number;
  boardNo: number;
  sectionId: number;
  source: 'stock' | 'offcut';
  stockLengthId: number | null;
  offcutId: number | null;
  lengthMm: number;
  trimMm: number;
  pieces: BoardPiece[];
  remainderMm: number;
  keepRemainder: boolean;
  /** One piece sold at the whole stock length: no trim, no cut (absent on older plans). */
  fullLength?: boolean;
  status: BoardStatus;
};

export type PlanViewData = {
  id: number;
  jobId: number;
  status: PlanStatus;
  settings: PlanSettings;
  sections: PlanSection[];
  totals: PlanTotals;
  price: CuttingPlanPrice | null;
  pricePence: number;
  createdAt: string;
  releasedAt: string | null;
  boards: PlanBoardView[];
  quote: QuoteView & { paidPence: number; paymentState: PaymentState };
};

export const planQuery = (planId: number) =>
  queryOptions({
    queryKey: planKeys.detail(planId),
    queryFn: () => fetchJson<PlanViewData>(`/api/plans/${planId}`),
  });

export type PlanOverrides = Partial<PlanSettings>;

export type PlanRunView = {
  runId: number;
  jobId: number;
  status: 'queued' | 'running' | 'done' | 'failed' | 'cancelled';
  sectionsTotal: number;
  sectionsDone: number;
  planId: number | null;
  error: string | null;
};

export const cancelPlanRunRequest = (runId: number) =>
  fetchJson<PlanRunView>(`/api/plan-runs/${runId}`, { method: 'DELETE' });

const RUN_POLL_MS = 1_000;

/**
 * Plans a job and resolves with the plan. The server answers with the plan itself (embedded) or with
 * a run id (the solver workers took it); then this follows the run, reporting each state, until done.
 */
export async function createPlanRequest(
  jobId: number,
  overrides: PlanOverrides = {},
  onProgress?: (run: PlanRunView) => void,
): Promise<PlanViewData> {
  const answer = await fetchJson<PlanViewData | { runId: number }>(`/api/jobs/${jobId}/plans`, {
    method: 'POST',
    body: JSON.stringify(overrides),
  });
  if (!('runId' in answer)) return answer;
  for (;;) {
    const run = await fetchJson<PlanRunView>(`/api/plan-runs/${answer.runId}`);
    onProgress?.(run);
    if (run.status === 'done' && run.planId) return fetchJson<PlanViewData>(`/api/plans/${run.planId}`);
    if (run.status === 'failed') throw new Error(run.error ?? 'The cutting engine could not plan this job.');
    if (run.status === 'cancelled') throw new Error('This planning run was cancelled.');
    await new Promise((resolve) => setTimeout(resolve, RUN_POLL_MS));
  }
}

/** Words for a run's state while the page waits. */
export function describePlanRun(run: PlanRunView): string {
  if (run.status === 'queued') return 'Waiting for a free solver…';
  if (run.status === 'running')
    return `Solving section ${Math.min(run.sectionsDone + 1, run.sectionsTotal)} of ${run.sectionsTotal}…`;
  return run.status === 'done' ? 'Done, opening the plan…' : 'Stopped.';
}

export const releasePlanRequest = (
  planId: number,
  { override, confirmShortfall }: ReleasePlanBodyInput = {},
) =>
  fetchJson<{ planId: number }>(`/api/plans/${planId}/release`, {
    method: 'POST',
    body: JSON.stringify({ override, confirmShortfall }),
  });
export const createQuoteLinkRequest = (planId: number) =>
  fetchJson<{ url: string; expiresAt: string }>(`/api/plans/${planId}/quote-link`, { method: 'POST' });
export const revokeQuoteLinksRequest = (planId: number) =>
  fetchJson<{ revoked: number }>(`/api/plans/${planId}/quote-link`, { method: 'DELETE' });
export const unreleasePlanRequest = (planId: number) =>
  fetchJson<{ planId: number }>(`/api/plans/${planId}/unrelease`, { method: 'POST' });

export const emailPlanRequest = (planId: number, body: { to?: string; message?: string }) =>
  fetchJson<{ sent: boolean; to: string; quoteUrl: string }>(`/api/plans/${planId}/email`, {
    method: 'POST',
    body: JSON.stringify(body),
  });
