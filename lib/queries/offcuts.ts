import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { importOffcuts } from '@/lib/offcuts/import-offcuts';
import type { listOffcuts } from '@/lib/offcuts/list-offcuts';
import type { moveOffcuts } from '@/lib/offcuts/move-offcuts';
import type { scrapOffcuts } from '@/lib/offcuts/scrap-offcuts';
import type {
  ImportOffcutsBodyInput,
  MoveOffcutsBodyInput,
  ScrapOffcutsBodyInput,
} from '@/lib/validations/offcuts';
import { fetchJson } from './fetch-json';
import { offcutKeys } from './query-keys';
import type { WireOf } from './wire';

export type OffcutPage = WireOf<typeof listOffcuts>;
export type OffcutRow = OffcutPage['offcuts'][number];
/** Filters as they sit in the URL: every value a string, empty meaning "any". */
export type RackFilters = Record<
  | 'q'
  | 'sectionId'
  | 'minLengthMm'
  | 'maxLengthMm'
  | 'location'
  | 'minAgeDays'
  | 'status'
  | 'sort'
  | 'dir'
  | 'page',
  string
>;

export const rackQueryString = (filters: Partial<RackFilters>) =>
  new URLSearchParams(
    Object.entries(filters).filter(([, v]) => v !== undefined && v !== '') as [string, string][],
  ).toString();

export const offcutsQuery = (filters: Partial<RackFilters>) =>
  queryOptions({
    queryKey: offcutKeys.list(filters),
    queryFn: () => fetchJson<OffcutPage>(`/api/offcuts?${rackQueryString(filters)}`),
    placeholderData: keepPreviousData,
  });

/** Moves one offcut or many to a rack location: the rack's bulk move, its row move and the saw's labels. */
export const moveOffcutsRequest = (ids: number[], location: string) =>
  fetchJson<WireOf<typeof moveOffcuts>>('/api/offcuts/move', {
    method: 'POST',
    body: JSON.stringify({ ids, location } satisfies MoveOffcutsBodyInput),
  });

export const scrapOffcutsRequest = (ids: number[], reason: string) =>
  fetchJson<WireOf<typeof scrapOffcuts>>('/api/offcuts/scrap', {
    method: 'POST',
    body: JSON.stringify({ ids, reason } satisfies ScrapOffcutsBodyInput),
  });

export const importOffcutsRequest = (csv: string) =>
  fetchJson<WireOf<typeof importOffcuts>>('/api/offcuts/import', {
    method: 'POST',
    body: JSON.stringify({ csv } satisfies ImportOffcutsBodyInput),
  });
