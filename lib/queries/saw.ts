import { queryOptions } from '@tanstack/react-query';
import type { PlanViewData } from './plans';
import type { confirmBoard } from '@/lib/saw/confirm-board';
import type { findOffcutByTag } from '@/lib/saw/find-offcut';
import type { getSawPlan } from '@/lib/saw/get-saw-plan';
import type { getSawQueue } from '@/lib/saw/get-saw-queue';
import type { reportDefect } from '@/lib/saw/report-defect';
import type { undoLastBoard } from '@/lib/saw/undo-last-board';
import type { ConfirmBoardBodyInput, ReportDefectBodyInput } from '@/lib/validations/saw';
import { fetchJson } from './fetch-json';
import { planKeys, sawKeys } from './query-keys';
import type { WireOf } from './wire';

export type SawPlan = WireOf<typeof getSawPlan>;
export type SawBoard = SawPlan['boards'][number];
export type SawQueueEntry = WireOf<typeof getSawQueue>[number];
export type OffcutBrief = WireOf<typeof findOffcutByTag>;

export const sawQueueQuery = () =>
  queryOptions({
    queryKey: sawKeys.queue,
    queryFn: () => fetchJson<{ queue: SawQueueEntry[] }>('/api/saw/queue').then((r) => r.queue),
    refetchInterval: 5_000,
  });

export const sawPlanQuery = (planId: number) =>
  queryOptions({
    queryKey: sawKeys.plan(planId),
    queryFn: () => fetchJson<SawPlan>(`/api/saw/plans/${planId}`),
    refetchInterval: 15_000,
  });

/** The office's view of a plan's boards (the plan API), polled for live saw progress. */
export const planProgressQuery = (planId: number) =>
  queryOptions({
    queryKey: planKeys.progress(planId),
    queryFn: () =>
      fetchJson<PlanViewData>(`/api/plans/${planId}`).then((p) => ({
        status: p.status,
        boards: p.boards.length,
        boardsDone: p.boards.filter((b) => b.status !== 'pending').length,
      })),
    refetchInterval: 5_000,
  });

export type BoardDoneAnswer = WireOf<typeof confirmBoard>;

export const confirmBoardRequest = (planId: number, boardNo: number, boardThere?: true) =>
  fetchJson<BoardDoneAnswer>(`/api/plans/${planId}/boards/${boardNo}/done`, {
    method: 'POST',
    body: JSON.stringify((boardThere ? { boardThere } : {}) satisfies ConfirmBoardBodyInput),
  });

export const undoBoardRequest = (planId: number) =>
  fetchJson<WireOf<typeof undoLastBoard>>(`/api/plans/${planId}/undo-board`, { method: 'POST' });

export type DefectAnswer = WireOf<typeof reportDefect>;

export const reportDefectRequest = (planId: number, boardNo: number, body: ReportDefectBodyInput) =>
  fetchJson<DefectAnswer>(`/api/plans/${planId}/boards/${boardNo}/defect`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

export const findOffcutRequest = (tag: string) =>
  fetchJson<{ offcut: OffcutBrief }>(`/api/saw/offcuts?tag=${encodeURIComponent(tag)}`).then((r) => r.offcut);
