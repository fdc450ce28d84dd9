import { queryOptions } from '@tanstack/react-query';
import type { FrameItem, FrameSchedulePanel, FrameSchedulePanelInput } from '@/lib/frames';
import type { CustomerChoice } from './customers';
import { fetchJson } from './fetch-json';
import { frameKeys } from './query-keys';

export type FrameUnit = 'mm' | 'imperial';
export type FrameScheduleDto = {
  id: number;
  name: string;
  customerName: string;
  customerEmail: string;
  unit: FrameUnit;
  panels: FrameSchedulePanel[];
  updatedAt: string;
  jobs: { id: number; reference: string; status: string }[];
};
export type FramePreviewDto = {
  unit: FrameUnit;
  panels: FrameSchedulePanel[];
  items: FrameItem[];
  warnings: string[];
  notice: string;
};
export type SaveFrameScheduleRequest = {
  name: string;
  customerName: string;
  unit: FrameUnit;
  panels: FrameSchedulePanelInput[];
};
export type SendToJobRequest = { ifAlreadySent?: 'replace' | 'add' } & (
  | { jobId: number }
  | { newJob: CustomerChoice & { customerEmail?: string; reference?: string; dueDate?: string } }
);

export const frameScheduleQuery = (id: number) =>
  queryOptions({
    queryKey: frameKeys.detail(id),
    queryFn: () => fetchJson<{ schedule: FrameScheduleDto }>(`/api/frames/${id}`).then((r) => r.schedule),
  });

export const previewFramesRequest = (body: { unit: FrameUnit; panels: FrameSchedulePanelInput[] }) =>
  fetchJson<FramePreviewDto>('/api/frames/preview', { method: 'POST', body: JSON.stringify(body) });

export const createFrameScheduleRequest = (body: Partial<SaveFrameScheduleRequest> & { name: string }) =>
  fetchJson<{ schedule: FrameScheduleDto }>('/api/frames', {
    method: 'POST',
    body: JSON.stringify(body),
  }).then((r) => r.schedule);

export const saveFrameScheduleRequest = (id: number, body: SaveFrameScheduleRequest) =>
  fetchJson<{ schedule: FrameScheduleDto }>(`/api/frames/${id}`, {
    method: 'PUT',
    body: JSON.stringify(body),
  }).then((r) => r.schedule);

export const copyFrameScheduleRequest = (id: number) =>
  fetchJson<{ schedule: FrameScheduleDto }>(`/api/frames/${id}/copy`, { method: 'POST' }).then(
    (r) => r.schedule,
  );

export const deleteFrameScheduleRequest = (id: number) =>
  fetchJson<null>(`/api/frames/${id}`, { method: 'DELETE' });

export const sendScheduleToJobRequest = (id: number, body: SendToJobRequest) =>
  fetchJson<{ jobId: number; lineCount: number }>(`/api/frames/${id}/send-to-job`, {
    method: 'POST',
    body: JSON.stringify(body),
  });
