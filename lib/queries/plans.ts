import { queryOptions } from '@tanstack/react-query';
import type { emailCutSheet } from '@/lib/cut-sheets/email-cut-sheet';
import type { PlanView } from '@/lib/plans/get-plan';
import type { getPlanWithQuote } from '@/lib/plans/get-plan-with-quote';
import type { PlanRunView as ServerPlanRunView } from '@/lib/plans/queue/plan-runs';
import type { releasePlan } from '@/lib/plans/release-plan';
import type { unreleasePlan } from '@/lib/plans/unrelease-plan';
import type { createQuoteLink, revokeQuoteLinks } from '@/lib/quotes/quote-links';
import type { checkPlanStock } from '@/lib/stock/check-plan-stock';
import type { EmailCutSheetBodyInput } from '@/lib/validations/mail';
import type { CreatePlanBodyInput } from '@/lib/validations/plans';
import type { ReleasePlanBodyInput } from '@/lib/validations/quotes';
import { fetchJson } from './fetch-json';
import { planKeys } from './query-keys';
import type { Wire, WireOf } from './wire';

export type PlanViewData = WireOf<typeof getPlanWithQuote>;
type PlanBoardRow = PlanViewData['boards'][number];
/** A board as the diagrams draw it: the same from a server page's plan and from the API. */
export type PlanBoardView = Pick<
  PlanBoardRow,
  | 'id'
  | 'boardNo'
  | 'sectionId'
  | 'source'
  | 'stockLengthId'
  | 'offcutId'
  | 'lengthMm'
  | 'trimMm'
  | 'pieces'
  | 'remainderMm'
  | 'keepRemainder'
  | 'status'
> &
  Partial<Pick<PlanBoardRow, 'fullLength'>>;
export type PlanRunView = Wire<ServerPlanRunView>;

export const planQuery = (planId: number) =>
  queryOptions({
    queryKey: planKeys.detail(planId),
    queryFn: () => fetchJson<PlanViewData>(`/api/plans/${planId}`),
  });

/** Stock lengths the plan needs more of than the yard holds. */
export const planStockCheckQuery = (planId: number) =>
  queryOptions({
    queryKey: planKeys.stockCheck(planId),
    queryFn: () => fetchJson<WireOf<typeof checkPlanStock>>(`/api/plans/${planId}/stock-check`),
  });

export const cancelPlanRunRequest = (runId: number) =>
  fetchJson<PlanRunView>(`/api/plan-runs/${runId}`, { method: 'DELETE' });

const RUN_POLL_MS = 1_000;

/**
 * Plans a job and resolves with the plan. The server answers with the plan itself (embedded) or with
 * a run id (the solver workers took it); then this follows the run, reporting each state, until done.
 */
export async function createPlanRequest(
  jobId: number,
  overrides: CreatePlanBodyInput = {},
  onProgress?: (run: PlanRunView) => void,
): Promise<Wire<PlanView>> {
  const answer = await fetchJson<Wire<PlanView> | { runId: number }>(`/api/jobs/${jobId}/plans`, {
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
  fetchJson<WireOf<typeof releasePlan>>(`/api/plans/${planId}/release`, {
    method: 'POST',
    body: JSON.stringify({ override, confirmShortfall }),
  });
export const createQuoteLinkRequest = (planId: number) =>
  fetchJson<WireOf<typeof createQuoteLink>>(`/api/plans/${planId}/quote-link`, { method: 'POST' });
export const revokeQuoteLinksRequest = (planId: number) =>
  fetchJson<WireOf<typeof revokeQuoteLinks>>(`/api/plans/${planId}/quote-link`, { method: 'DELETE' });
export const unreleasePlanRequest = (planId: number) =>
  fetchJson<WireOf<typeof unreleasePlan>>(`/api/plans/${planId}/unrelease`, { method: 'POST' });

export const emailPlanRequest = (planId: number, body: EmailCutSheetBodyInput) =>
  fetchJson<WireOf<typeof emailCutSheet>>(`/api/plans/${planId}/email`, {
    method: 'POST',
    body: JSON.stringify(body),
  });
