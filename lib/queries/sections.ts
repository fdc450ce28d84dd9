import { queryOptions } from '@tanstack/react-query';
import { fetchJson } from './fetch-json';

export type SectionOption = {
  id: number;
  code: string;
  name: string;
  stockLengths: { id: number; lengthMm: number; pricePence: number; onHand: number | null }[];
};

export const sectionsQuery = () =>
  queryOptions({
    queryKey: ['sections'],
    queryFn: () => fetchJson<{ sections: SectionOption[] }>('/api/sections').then((r) => r.sections),
    staleTime: 5 * 60_000,
  });
