import { queryOptions } from '@tanstack/react-query';
import type { SawPlan } from '@/lib/saw/get-saw-plan';
import type { SawQueueEntry } from '@/lib/saw/get-saw-queue';
import type { OffcutBrief } from '@/lib/saw/find-offcut';
import type { ReportDefectBody } from '@/lib/validations/saw';
import { fetchJson } from './fetch-json';
import { planKeys, sawKeys } from './query-keys';

export type { SawPlan, SawQueueEntry, OffcutBrief };
export type SawBoard = SawPlan['boards'][number];

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
      fetchJson<{ status: string; boards: { status: string }[] }>(`/api/plans/${planId}`).then((p) => ({
        status: p.status,
        boards: p.boards.length,
        boardsDone: p.boards.filter((b) => b.status !== 'pending').length,
      })),
    refetchInterval: 5_000,
  });

export type BoardDoneAnswer = {
  boardNo: number;
  alreadyDone: boolean;
  newOffcut: { id: number; tag: string } | null;
  boards: number;
  boardsDone: number;
  planStatus: string;
  jobStatus: string;
};

export const confirmBoardRequest = (planId: number, boardNo: number, boardThere?: true) =>
  fetchJson<BoardDoneAnswer>(`/api/plans/${planId}/boards/${boardNo}/done`, {
    method: 'POST',
    body: JSON.stringify(boardThere ? { boardThere } : {}),
  });

export const undoBoardRequest = (planId: number) =>
  fetchJson<{ boardNo: number }>(`/api/plans/${planId}/undo-board`, { method: 'POST' });

export type DefectAnswer = {
  boardNo: number;
  alreadyReported: boolean;
  newOffcut: { id: number; tag: string } | null;
  replan: { boardNos: number[]; unplaced: { label: string; length: number }[] } | null;
};

export const reportDefectRequest = (planId: number, boardNo: number, body: ReportDefectBody) =>
  fetchJson<DefectAnswer>(`/api/plans/${planId}/boards/${boardNo}/defect`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

export const findOffcutRequest = (tag: string) =>
  fetchJson<{ offcut: OffcutBrief }>(`/api/saw/offcuts?tag=${encodeURIComponent(tag)}`).then((r) => r.offcut);
