import { queryOptions } from '@tanstack/react-query';
import type { BoardStatus, PlanStatus } from '@/db/enums';
import type { CuttingPlanPrice } from '@/lib/pricing/pricing-types';
import type { BoardPiece, PlanSection, PlanSettings, PlanTotals } from '@/lib/plans/plan-shapes';
import type { QuoteView } from '@/lib/quotes/get-plan-quote';
import type { PaymentState } from '@/lib/quotes/payment-state';
import type { ReleasePlanBody } from '@/lib/validations/quotes';
import { fetchJson } from './fetch-json';

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
    queryKey: ['plan', planId],
    queryFn: () => fetchJson<PlanViewData>(`/api/plans/${planId}`),
  });

export type PlanOverrides = Partial<PlanSettings>;

export const createPlanRequest = (jobId: number, overrides: PlanOverrides = {}) =>
  fetchJson<PlanViewData>(`/api/jobs/${jobId}/plans`, { method: 'POST', body: JSON.stringify(overrides) });

export const releasePlanRequest = (planId: number, { override, confirmShortfall }: ReleasePlanBody = {}) =>
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
