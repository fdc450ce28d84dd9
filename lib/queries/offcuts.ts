import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { OffcutStatus } from '@/db/enums';
import type { moveOffcuts } from '@/lib/offcuts/move-offcuts';
import { fetchJson } from './fetch-json';
import { offcutKeys } from './query-keys';

export type OffcutRow = {
  id: number;
  tag: string;
  sectionId: number;
  sectionName: string;
  lengthMm: number;
  location: string;
  status: OffcutStatus;
  origin: string;
  scrapReason: string | null;
  createdAt: string;
};
export type OffcutPage = {
  offcuts: OffcutRow[];
  total: number;
  page: number;
  pageSize: number;
  locations: string[];
};
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
  fetchJson<Awaited<ReturnType<typeof moveOffcuts>>>('/api/offcuts/move', {
    method: 'POST',
    body: JSON.stringify({ ids, location }),
  });

export const scrapOffcutsRequest = (ids: number[], reason: string) =>
  fetchJson<{ scrapped: number }>('/api/offcuts/scrap', {
    method: 'POST',
    body: JSON.stringify({ ids, reason }),
  });

export const importOffcutsRequest = (csv: string) =>
  fetchJson<{ imported: number; tags: string[] }>('/api/offcuts/import', {
    method: 'POST',
    body: JSON.stringify({ csv }),
  });
