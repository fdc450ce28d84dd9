import 'server-only';
import { sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { stockLengths } from '@/db/schema';

/**
 * What a metre of each section costs the yard: its cheapest stock length per metre, at cost price
 * where the owner entered one, else at selling price. Values offcuts and waste in reports.
 */
export async function getSectionPencePerMetre(db: DbOrTx): Promise<Map<number, number>> {
  const rows = await db
    .select({
      sectionId: stockLengths.sectionId,
      perMetre: sql<number>`min(coalesce(${stockLengths.costPence}, ${stockLengths.pricePence}) * 1000.0 / ${stockLengths.lengthMm})::float8`,
    })
    .from(stockLengths)
    .groupBy(stockLengths.sectionId);
  return new Map(rows.map((r) => [r.sectionId, Number(r.perMetre)]));
}
