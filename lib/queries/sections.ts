import { queryOptions } from '@tanstack/react-query';
import { fetchJson } from './fetch-json';

export type SectionOption = {
  id: number;
  code: string;
  name: string;
  /** Tolerance a line marked nominal gets: the section's own, else the yard's. */
  nominalDefaultMm: number;
  stockLengths: { id: number; lengthMm: number; pricePence: number; onHand: number | null }[];
};

type CatalogueSection = Omit<SectionOption, 'stockLengths'> & {
  active: boolean;
  lengths: (SectionOption['stockLengths'][number] & { active: boolean })[];
};

/** Sections a cut list may use: the active ones, with their active stock lengths. */
export const sectionsQuery = () =>
  queryOptions({
    // Under ['sections'] so the stock pages' invalidations refresh it too; its own key because the shape differs.
    queryKey: ['sections', 'cut-list-options'],
    queryFn: () =>
      fetchJson<{ sections: CatalogueSection[] }>('/api/sections').then((r) =>
        r.sections
          .filter((s) => s.active)
          .map((s) => ({
            id: s.id,
            code: s.code,
            name: s.name,
            nominalDefaultMm: s.nominalDefaultMm,
            stockLengths: s.lengths.filter((l) => l.active),
          })),
      ),
    staleTime: 5 * 60_000,
  });
