import { and, asc, eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { jobItems, jobs, offcuts, sections, stockLengths } from '@/db/schema';
import { notFound } from '@/lib/errors';

/** Everything the planner needs for one job: its line items and, per section, stock and rack. */
export async function loadPlanningData(db: DbOrTx, jobId: number) {
  const [job] = await db.select().from(jobs).where(eq(jobs.id, jobId));
  if (!job) throw notFound('That job');
  const items = await db
    .select()
    .from(jobItems)
    .where(eq(jobItems.jobId, jobId))
    .orderBy(asc(jobItems.position));
  const sectionIds = [...new Set(items.map((i) => i.sectionId))];
  if (sectionIds.length === 0) return { job, items, sections: [], stock: [], offcuts: [] };
  const [sectionRows, stockRows, offcutRows] = await Promise.all([
    db.select().from(sections).where(inArray(sections.id, sectionIds)),
    db.select().from(stockLengths).where(inArray(stockLengths.sectionId, sectionIds)),
    db
      .select({ id: offcuts.id, sectionId: offcuts.sectionId, lengthMm: offcuts.lengthMm })
      .from(offcuts)
      .where(and(inArray(offcuts.sectionId, sectionIds), eq(offcuts.status, 'available')))
      .orderBy(asc(offcuts.id)),
  ]);
  return { job, items, sections: sectionRows, stock: stockRows, offcuts: offcutRows };
}
