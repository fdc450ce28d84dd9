import 'server-only';
import { asc } from 'drizzle-orm';
import { getDb } from '@/db';
import { sections, stockLengths } from '@/db/schema';
import { nominalToleranceFor } from '@/lib/nominal/tolerance';
import { getYardSettings } from '@/lib/yard/get-yard-settings';

export type SectionWithLengths = Awaited<ReturnType<typeof listSections>>[number];

/** The sections catalogue with each section's stock lengths, shortest first. Cost prices only when asked (owner). */
export async function listSections({ withCost = false }: { withCost?: boolean } = {}) {
  const db = await getDb();
  const [sectionRows, lengthRows, yard] = await Promise.all([
    db.select().from(sections).orderBy(asc(sections.name)),
    db.select().from(stockLengths).orderBy(asc(stockLengths.lengthMm)),
    getYardSettings(db),
  ]);
  return sectionRows.map((s) => ({
    id: s.id,
    code: s.code,
    name: s.name,
    thicknessMm: s.thicknessMm,
    widthMm: s.widthMm,
    species: s.species,
    grade: s.grade,
    treatment: s.treatment,
    finish: s.finish,
    finishedThicknessMm: s.finishedThicknessMm,
    finishedWidthMm: s.finishedWidthMm,
    moisture: s.moisture,
    minKeepMm: s.minKeepMm,
    nominalToleranceMm: s.nominalToleranceMm,
    /** What a line marked nominal gets: the section's own figure, else the yard's. */
    nominalDefaultMm: nominalToleranceFor({
      sectionToleranceMm: s.nominalToleranceMm,
      yardToleranceMm: yard.lengthToleranceMm,
    }),
    active: s.active,
    lengths: lengthRows
      .filter((l) => l.sectionId === s.id)
      .map((l) => ({
        id: l.id,
        lengthMm: l.lengthMm,
        pricePence: l.pricePence,
        costPence: withCost ? l.costPence : null,
        onHand: l.onHand,
        active: l.active,
      })),
  }));
}
