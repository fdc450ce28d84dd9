import type { JobItemRow } from '@/lib/queries/jobs';

export type SectionTotal = {
  sectionId: number;
  sectionName: string;
  rows: number;
  pieces: number;
  lengthMm: number;
};

/** Pieces and running length per section, in the order sections first appear in the list. */
export function sumItemsPerSection(items: JobItemRow[]): SectionTotal[] {
  const totals = new Map<number, SectionTotal>();
  for (const item of items) {
    const t = totals.get(item.sectionId) ?? {
      sectionId: item.sectionId,
      sectionName: item.sectionName,
      rows: 0,
      pieces: 0,
      lengthMm: 0,
    };
    t.rows += 1;
    t.pieces += item.quantity;
    t.lengthMm += item.quantity * item.lengthMm;
    totals.set(item.sectionId, t);
  }
  return [...totals.values()];
}
