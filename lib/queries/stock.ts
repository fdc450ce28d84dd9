import { queryOptions } from '@tanstack/react-query';
import type { MoistureState } from '@/db/enums';
import { fetchJson } from './fetch-json';
import { stockKeys } from './query-keys';

export type StockLengthRow = {
  id: number;
  lengthMm: number;
  pricePence: number;
  /** Owner only; null when not entered or not shown. */
  costPence: number | null;
  onHand: number | null;
  active: boolean;
};
export type SectionRow = {
  id: number;
  code: string;
  name: string;
  thicknessMm: number;
  widthMm: number;
  species: string;
  grade: string;
  treatment: string;
  finish: 'sawn' | 'planed';
  finishedThicknessMm: number | null;
  finishedWidthMm: number | null;
  moisture: MoistureState;
  minKeepMm: number | null;
  /** How short a nominal piece may be; null: the yard's setting. */
  nominalToleranceMm: number | null;
  nominalDefaultMm: number;
  active: boolean;
  lengths: StockLengthRow[];
};
export type MovementRow = {
  id: number;
  at: string;
  kind: string;
  sectionName: string;
  lengthMm: number;
  quantityDelta: number;
  reason: string;
  userName: string | null;
};
export type SectionInput = Omit<SectionRow, 'id' | 'lengths' | 'nominalDefaultMm'> & {
  lengths: {
    id?: number;
    lengthMm: number;
    pricePence: number;
    costPence: number | null;
    unlimited: boolean;
    active: boolean;
  }[];
};

export const stockMovementsQuery = () =>
  queryOptions({
    queryKey: stockKeys.movements,
    queryFn: () => fetchJson<{ movements: MovementRow[] }>('/api/stock/movements').then((r) => r.movements),
  });

export const receiveStockRequest = (body: {
  reference: string;
  lines: { stockLengthId: number; quantity: number }[];
}) => fetchJson('/api/stock/receipts', { method: 'POST', body: JSON.stringify(body) });

export const stocktakeRequest = (body: {
  reason: string;
  counts: { stockLengthId: number; counted: number }[];
}) => fetchJson('/api/stock/stocktakes', { method: 'POST', body: JSON.stringify(body) });

export const saveSectionRequest = (sectionId: number | null, body: SectionInput) =>
  fetchJson(sectionId ? `/api/sections/${sectionId}` : '/api/sections', {
    method: sectionId ? 'PATCH' : 'POST',
    body: JSON.stringify(body),
  });
