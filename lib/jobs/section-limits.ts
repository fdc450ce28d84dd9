import 'server-only';
import { and, eq, max } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { offcuts, sections, stockLengths } from '@/db/schema';

/** Per active section: the longest active stock length or available offcut, in mm. */
export async function getSectionLimits(db: DbOrTx) {
  const [sectionRows, stock, rack] = await Promise.all([
    db
      .select({ id: sections.id, name: sections.name, code: sections.code })
      .from(sections)
      .where(eq(sections.active, true)),
    db
      .select({ sectionId: stockLengths.sectionId, longest: max(stockLengths.lengthMm) })
      .from(stockLengths)
      .where(eq(stockLengths.active, true))
      .groupBy(stockLengths.sectionId),
    db
      .select({ sectionId: offcuts.sectionId, longest: max(offcuts.lengthMm) })
      .from(offcuts)
      .where(and(eq(offcuts.status, 'available')))
      .groupBy(offcuts.sectionId),
  ]);
  const longest = new Map<number, number>();
  for (const row of [...stock, ...rack]) {
    longest.set(row.sectionId, Math.max(longest.get(row.sectionId) ?? 0, row.longest ?? 0));
  }
  return { sections: sectionRows, longestMm: (sectionId: number) => longest.get(sectionId) ?? 0 };
}
