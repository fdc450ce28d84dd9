import { queryOptions } from '@tanstack/react-query';
import type { listSections } from '@/lib/stock/list-sections';
import type { listStockMovements } from '@/lib/stock/list-stock-movements';
import type { receiveStock } from '@/lib/stock/receive-stock';
import type { createSection, updateSection } from '@/lib/stock/save-section';
import type { takeStock } from '@/lib/stock/take-stock';
import type { ReceiptBodyInput, SectionBodyInput, StocktakeBodyInput } from '@/lib/validations/stock';
import { fetchJson } from './fetch-json';
import { stockKeys } from './query-keys';
import type { WireOf } from './wire';

export type SectionRow = WireOf<typeof listSections>[number];
export type StockLengthRow = SectionRow['lengths'][number];
export type MovementRow = WireOf<typeof listStockMovements>[number];

export const stockMovementsQuery = () =>
  queryOptions({
    queryKey: stockKeys.movements,
    queryFn: () => fetchJson<{ movements: MovementRow[] }>('/api/stock/movements').then((r) => r.movements),
  });

export const receiveStockRequest = (body: ReceiptBodyInput) =>
  fetchJson<{ movements: WireOf<typeof receiveStock> }>('/api/stock/receipts', {
    method: 'POST',
    body: JSON.stringify(body),
  });

export const stocktakeRequest = (body: StocktakeBodyInput) =>
  fetchJson<{ movements: WireOf<typeof takeStock> }>('/api/stock/stocktakes', {
    method: 'POST',
    body: JSON.stringify(body),
  });

export const saveSectionRequest = (sectionId: number | null, body: SectionBodyInput) =>
  fetchJson<{ section: WireOf<typeof createSection> | WireOf<typeof updateSection> }>(
    sectionId ? `/api/sections/${sectionId}` : '/api/sections',
    { method: sectionId ? 'PATCH' : 'POST', body: JSON.stringify(body) },
  );
