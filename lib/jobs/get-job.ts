import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobItems, jobs, sections } from '@/db/schema';
import { notFound } from '@/lib/errors';
import { listJobPlans } from '@/lib/plans/list-job-plans';

/** A job with its line items (in list order, with section names) and its plans. */
export async function getJobById({ jobId }: { jobId: number }) {
  const db = await getDb();
  const [job] = await db.select().from(jobs).where(eq(jobs.id, jobId));
  if (!job) throw notFound('That job');
  const [items, plans] = await Promise.all([
    db
      .select({
        id: jobItems.id,
        sectionId: jobItems.sectionId,
        sectionName: sections.name,
        sectionCode: sections.code,
        lengthMm: jobItems.lengthMm,
        quantity: jobItems.quantity,
        label: jobItems.label,
        note: jobItems.note,
        marks: jobItems.marks,
        toleranceMm: jobItems.toleranceMm,
        position: jobItems.position,
      })
      .from(jobItems)
      .innerJoin(sections, eq(sections.id, jobItems.sectionId))
      .where(eq(jobItems.jobId, jobId))
      .orderBy(asc(jobItems.position), asc(jobItems.id)),
    listJobPlans({ jobId }, db),
  ]);
  return { job, items, plans };
}
export type JobDetail = Awaited<ReturnType<typeof getJobById>>;
