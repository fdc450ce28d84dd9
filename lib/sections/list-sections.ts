import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { sections, stockLengths } from '@/db/schema';

/** Active sections with their active stock lengths, shortest first: what cut lists may ask for. */
export async function listSectionsWithStock(tx?: DbOrTx) {
  const db = tx ?? (await getDb());
  const [sectionRows, lengthRows] = await Promise.all([
    db.select().from(sections).where(eq(sections.active, true)).orderBy(asc(sections.name)),
    db.select().from(stockLengths).where(eq(stockLengths.active, true)).orderBy(asc(stockLengths.lengthMm)),
  ]);
  return sectionRows.map((s) => ({
    id: s.id,
    code: s.code,
    name: s.name,
    thicknessMm: s.thicknessMm,
    widthMm: s.widthMm,
    grade: s.grade,
    treatment: s.treatment,
    stockLengths: lengthRows
      .filter((l) => l.sectionId === s.id)
      .map((l) => ({ id: l.id, lengthMm: l.lengthMm, pricePence: l.pricePence, onHand: l.onHand })),
  }));
}
export type SectionWithStock = Awaited<ReturnType<typeof listSectionsWithStock>>[number];
