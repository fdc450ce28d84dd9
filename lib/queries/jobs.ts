import { queryOptions } from '@tanstack/react-query';
import type { JobListShow, JobStatus } from '@/db/enums';
import type { createJob } from '@/lib/jobs/create-job';
import type { getJobById } from '@/lib/jobs/get-job';
import type { addJobItem, deleteJobItem, updateJobItem } from '@/lib/jobs/job-items';
import type { listJobs } from '@/lib/jobs/list-jobs';
import type { updateJob } from '@/lib/jobs/update-job';
import type {
  CreateJobBodyInput,
  JobItemBodyInput,
  UpdateJobBodyInput,
  UpdateJobItemBodyInput,
} from '@/lib/validations/jobs';
import { fetchJson } from './fetch-json';
import { jobKeys } from './query-keys';
import type { WireOf } from './wire';

export type JobFilters = {
  q?: string;
  status?: JobStatus | '';
  show?: JobListShow | '';
  dueFrom?: string;
  dueTo?: string;
};

export type JobListRow = WireOf<typeof listJobs>[number];
export type JobDetail = WireOf<typeof getJobById>;
export type JobRecord = JobDetail['job'];
export type JobItemRow = JobDetail['items'][number];
export type JobPlanRow = JobDetail['plans'][number];

export const jobsQuery = (filters: JobFilters) =>
  queryOptions({
    queryKey: jobKeys.list(filters),
    queryFn: () => {
      const params = new URLSearchParams(Object.entries(filters).filter(([, v]) => v) as [string, string][]);
      return fetchJson<{ jobs: JobListRow[] }>(`/api/jobs?${params}`).then((r) => r.jobs);
    },
  });

export const jobQuery = (jobId: number) =>
  queryOptions({
    queryKey: jobKeys.detail(jobId),
    queryFn: () => fetchJson<JobDetail>(`/api/jobs/${jobId}`),
  });

export const createJobRequest = (body: CreateJobBodyInput) =>
  fetchJson<{ job: WireOf<typeof createJob> }>('/api/jobs', { method: 'POST', body: JSON.stringify(body) });

export const updateJobRequest = (jobId: number, body: UpdateJobBodyInput) =>
  fetchJson<{ job: WireOf<typeof updateJob> }>(`/api/jobs/${jobId}`, {
    method: 'PATCH',
    body: JSON.stringify(body),
  });

export const addItemRequest = (jobId: number, body: JobItemBodyInput) =>
  fetchJson<{ item: WireOf<typeof addJobItem> }>(`/api/jobs/${jobId}/items`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

export const updateItemRequest = (jobId: number, itemId: number, body: UpdateJobItemBodyInput) =>
  fetchJson<{ item: WireOf<typeof updateJobItem> }>(`/api/jobs/${jobId}/items/${itemId}`, {
    method: 'PATCH',
    body: JSON.stringify(body),
  });

export const deleteItemRequest = (jobId: number, itemId: number) =>
  fetchJson<WireOf<typeof deleteJobItem>>(`/api/jobs/${jobId}/items/${itemId}`, { method: 'DELETE' });

export const importItemsRequest = (jobId: number, csvText: string, replace: boolean) =>
  fetchJson<{ imported: number }>(`/api/jobs/${jobId}/items/import${replace ? '?replace=1' : ''}`, {
    method: 'POST',
    body: csvText,
    headers: { 'content-type': 'text/csv' },
  });
