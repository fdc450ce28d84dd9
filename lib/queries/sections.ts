import { queryOptions } from '@tanstack/react-query';
import { fetchJson } from './fetch-json';
import { sectionKeys } from './query-keys';
import type { SectionRow } from './stock';

export type SectionOption = {
  id: number;
  code: string;
  name: string;
  /** Tolerance a line marked nominal gets: the section's own, else the yard's. */
  nominalDefaultMm: number;
  stockLengths: { id: number; lengthMm: number; pricePence: number; onHand: number | null }[];
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
