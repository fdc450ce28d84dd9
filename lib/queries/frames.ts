import { queryOptions } from '@tanstack/react-query';
import type { FramePreviewBody, FramePreviewBodyInput } from '@/lib/frames';
import type {
  copyFrameSchedule,
  createFrameSchedule,
  getFrameScheduleById,
  updateFrameSchedule,
} from '@/lib/frames-data/frame-schedules';
import type { previewFrameSchedule } from '@/lib/frames-data/preview-frame-schedule';
import type { sendScheduleToJob } from '@/lib/frames-data/send-schedule-to-job';
import type { SaveFrameScheduleBodyInput, SendScheduleToJobBodyInput } from '@/lib/validations/frames';
import { fetchJson } from './fetch-json';
import { frameKeys } from './query-keys';
import type { Wire, WireOf } from './wire';

export type FrameScheduleDto = WireOf<typeof getFrameScheduleById>;
/** The preview answer: the panels as the server read them, and their cut list. */
export type FramePreviewDto = Wire<Pick<FramePreviewBody, 'unit' | 'panels'>> &
  Pick<WireOf<typeof previewFrameSchedule>, 'items' | 'warnings' | 'notice'>;

export const frameScheduleQuery = (id: number) =>
  queryOptions({
    queryKey: frameKeys.detail(id),
    queryFn: () => fetchJson<{ schedule: FrameScheduleDto }>(`/api/frames/${id}`).then((r) => r.schedule),
  });

export const previewFramesRequest = (body: FramePreviewBodyInput) =>
  fetchJson<FramePreviewDto>('/api/frames/preview', { method: 'POST', body: JSON.stringify(body) });

export const createFrameScheduleRequest = (body: SaveFrameScheduleBodyInput) =>
  fetchJson<{ schedule: WireOf<typeof createFrameSchedule> }>('/api/frames', {
    method: 'POST',
    body: JSON.stringify(body),
  }).then((r) => r.schedule);

export const saveFrameScheduleRequest = (id: number, body: SaveFrameScheduleBodyInput) =>
  fetchJson<{ schedule: WireOf<typeof updateFrameSchedule> }>(`/api/frames/${id}`, {
    method: 'PUT',
    body: JSON.stringify(body),
  }).then((r) => r.schedule);

export const copyFrameScheduleRequest = (id: number) =>
  fetchJson<{ schedule: WireOf<typeof copyFrameSchedule> }>(`/api/frames/${id}/copy`, {
    method: 'POST',
  }).then((r) => r.schedule);

export const deleteFrameScheduleRequest = (id: number) =>
  fetchJson<null>(`/api/frames/${id}`, { method: 'DELETE' });

export const sendScheduleToJobRequest = (id: number, body: SendScheduleToJobBodyInput) =>
  fetchJson<Pick<WireOf<typeof sendScheduleToJob>, 'jobId' | 'lineCount'>>(`/api/frames/${id}/send-to-job`, {
    method: 'POST',
    body: JSON.stringify(body),
  });
