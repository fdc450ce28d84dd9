import { queryOptions } from '@tanstack/react-query';
import type { JobListShow, JobStatus, PlanStatus } from '@/db/enums';
import type { PlanSettings, PlanTotals } from '@/lib/plans/plan-shapes';
import type { PaymentState } from '@/lib/quotes/payment-state';
import type { NewCustomerBody } from './customers';
import { fetchJson } from './fetch-json';
import { jobKeys } from './query-keys';

export type JobFilters = {
  q?: string;
  status?: JobStatus | '';
  show?: JobListShow | '';
  dueFrom?: string;
  dueTo?: string;
};

export type JobListRow = {
  id: number;
  reference: string;
  customerName: string;
  customerEmail: string;
  dueDate: string | null;
  status: JobStatus;
  itemCount: number;
  pieceCount: number;
  /** The latest quote and where its acceptance and payment stand (null before the first plan). */
  quoteNumber: string | null;
  paymentState: PaymentState | null;
};

export type JobRecord = Omit<JobListRow, 'itemCount' | 'pieceCount' | 'quoteNumber' | 'paymentState'> & {
  customerId: number | null;
  notes: string;
  createdAt: string;
  updatedAt: string;
};

export type JobItemRow = {
  id: number;
  sectionId: number;
  sectionName: string;
  sectionCode: string;
  lengthMm: number;
  quantity: number;
  label: string;
  note: string;
  /** Millimetres the piece may be cut short; 0: exact. */
  toleranceMm: number;
  position: number;
};

export type JobPlanRow = {
  id: number;
  status: PlanStatus;
  settings: PlanSettings;
  totals: PlanTotals;
  pricePence: number;
  createdAt: string;
  releasedAt: string | null;
};

export type JobDetail = { job: JobRecord; items: JobItemRow[]; plans: JobPlanRow[] };

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

export type JobDetailsBody = Partial<{ customerId: number; newCustomer: NewCustomerBody }> & {
  customer?: string;
  reference?: string;
  dueDate?: string | null;
  customerEmail?: string;
  notes?: string;
  status?: 'cancelled' | 'draft';
};

export const createJobRequest = (body: JobDetailsBody) =>
  fetchJson<{ job: JobRecord }>('/api/jobs', { method: 'POST', body: JSON.stringify(body) });

export const updateJobRequest = (jobId: number, body: JobDetailsBody) =>
  fetchJson<{ job: JobRecord }>(`/api/jobs/${jobId}`, { method: 'PATCH', body: JSON.stringify(body) });

export type ItemBody = {
  sectionId?: number;
  length?: number | string;
  quantity?: number;
  label?: string;
  note?: string;
  /** Nominal without a figure: the section's tolerance, else the yard's. */
  nominal?: boolean;
  toleranceMm?: number | null;
};

export const addItemRequest = (jobId: number, body: ItemBody) =>
  fetchJson(`/api/jobs/${jobId}/items`, { method: 'POST', body: JSON.stringify(body) });

export const updateItemRequest = (jobId: number, itemId: number, body: ItemBody) =>
  fetchJson(`/api/jobs/${jobId}/items/${itemId}`, { method: 'PATCH', body: JSON.stringify(body) });

export const deleteItemRequest = (jobId: number, itemId: number) =>
  fetchJson(`/api/jobs/${jobId}/items/${itemId}`, { method: 'DELETE' });

export const importItemsRequest = (jobId: number, csvText: string, replace: boolean) =>
  fetchJson<{ imported: number }>(`/api/jobs/${jobId}/items/import${replace ? '?replace=1' : ''}`, {
    method: 'POST',
    body: csvText,
    headers: { 'content-type': 'text/csv' },
  });
