import 'server-only';
import { eq, inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, offcuts, plans, sections } from '@/db/schema';
import { notFound } from '@/lib/errors';

const offcutColumns = {
  id: offcuts.id,
  tag: offcuts.tag,
  lengthMm: offcuts.lengthMm,
  location: offcuts.location,
  status: offcuts.status,
  origin: offcuts.origin,
  createdAt: offcuts.createdAt,
  sectionName: sections.name,
  reservedFor: jobs.reference,
};

function offcutQuery(db: Awaited<ReturnType<typeof getDb>>) {
  return db
    .select(offcutColumns)
    .from(offcuts)
    .innerJoin(sections, eq(sections.id, offcuts.sectionId))
    .leftJoin(plans, eq(plans.id, offcuts.reservedByPlanId))
    .leftJoin(jobs, eq(jobs.id, plans.jobId));
}

/** One offcut by its tag, as scanned from a label or typed (case does not matter). */
export async function findOffcutByTag({ tag }: { tag: string }) {
  const db = await getDb();
  const [offcut] = await offcutQuery(db).where(eq(sql`upper(${offcuts.tag})`, tag.toUpperCase()));
  if (!offcut) throw notFound(`Offcut ${tag}`);
  return offcut;
}

/** Offcuts for printing labels, in the order asked for. */
export async function getOffcutsForLabels({ ids }: { ids: number[] }) {
  const db = await getDb();
  const rows = await offcutQuery(db).where(inArray(offcuts.id, ids));
  return ids.flatMap((id) => rows.filter((r) => r.id === id));
}
export type OffcutBrief = Awaited<ReturnType<typeof findOffcutByTag>>;

/** Every offcut a plan's boards made (kept remainders and sound parts), for a sheet of labels. */
export async function getOffcutsMadeByPlan({ planId }: { planId: number }) {
  const db = await getDb();
  return offcutQuery(db).where(eq(offcuts.originPlanId, planId)).orderBy(offcuts.id);
}
