import 'server-only';
import { and, eq, max } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { offcuts, sections, stockLengths, yardSettings } from '@/db/schema';
import { nominalToleranceFor } from '@/lib/nominal/tolerance';

/**
 * Per active section: the longest active stock length or available offcut, in mm, and how short a
 * nominal piece may be; and the yard's minimum safe piece length.
 */
export async function getSectionLimits(db: DbOrTx) {
  const [sectionRows, stock, rack, settings] = await Promise.all([
    db
      .select({
        id: sections.id,
        name: sections.name,
        code: sections.code,
        nominalToleranceMm: sections.nominalToleranceMm,
      })
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
    db
      .select({
        minSafePieceMm: yardSettings.minSafePieceMm,
        lengthToleranceMm: yardSettings.lengthToleranceMm,
      })
      .from(yardSettings)
      .limit(1),
  ]);
  const longest = new Map<number, number>();
  for (const row of [...stock, ...rack]) {
    longest.set(row.sectionId, Math.max(longest.get(row.sectionId) ?? 0, row.longest ?? 0));
  }
  return {
    sections: sectionRows,
    minSafePieceMm: settings[0]?.minSafePieceMm ?? 0,
    longestMm: (sectionId: number) => longest.get(sectionId) ?? 0,
    /** A nominal piece's tolerance in this section: the section's own, else the yard's. */
    nominalToleranceMm: (sectionId: number) =>
      nominalToleranceFor({
        sectionToleranceMm: sectionRows.find((s) => s.id === sectionId)?.nominalToleranceMm,
        yardToleranceMm: settings[0]?.lengthToleranceMm ?? 0,
      }),
  };
}
