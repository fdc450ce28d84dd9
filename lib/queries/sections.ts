import { queryOptions } from '@tanstack/react-query';
import { fetchJson } from './fetch-json';
import { sectionKeys } from './query-keys';
import type { SectionRow, StockLengthRow } from './stock';

/** A section a cut list may use; `nominalDefaultMm` is what a line marked nominal gets. */
export type SectionOption = Pick<SectionRow, 'id' | 'code' | 'name' | 'nominalDefaultMm'> & {
  stockLengths: Pick<StockLengthRow, 'id' | 'lengthMm' | 'pricePence' | 'onHand'>[];
};

/** The sections catalogue (every section and stock length, active or not): the one fetch of it. */
export const sectionsQuery = () =>
  queryOptions({
    queryKey: sectionKeys.all,
    queryFn: () => fetchJson<{ sections: SectionRow[] }>('/api/sections').then((r) => r.sections),
  });

const toSectionOptions = (sections: SectionRow[]): SectionOption[] =>
  sections
    .filter((s) => s.active)
    .map((s) => ({
      id: s.id,
      code: s.code,
      name: s.name,
      nominalDefaultMm: s.nominalDefaultMm,
      stockLengths: s.lengths.filter((l) => l.active),
    }));

/** Sections a cut list may use: the active ones, with their active stock lengths (same cache as the catalogue). */
export const sectionOptionsQuery = () =>
  queryOptions({ ...sectionsQuery(), select: toSectionOptions, staleTime: 5 * 60_000 });
