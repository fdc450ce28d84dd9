import 'server-only';
import { eq, inArray } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, offcuts, planBoards, plans } from '@/db/schema';
import { notFound } from '@/lib/errors';

/** What a plan page shows beside the plan: its job and the rack tags of the offcuts it uses. */
export async function getPlanContext({ planId }: { planId: number }) {
  const db = await getDb();
  const [row] = await db
    .select({
      jobId: jobs.id,
      reference: jobs.reference,
      customerName: jobs.customerName,
      customerEmail: jobs.customerEmail,
      jobStatus: jobs.status,
    })
    .from(plans)
    .innerJoin(jobs, eq(jobs.id, plans.jobId))
    .where(eq(plans.id, planId));
  if (!row) throw notFound('That plan');
  const boards = await db
    .select({ offcutId: planBoards.offcutId })
    .from(planBoards)
    .where(eq(planBoards.planId, planId));
  const ids = boards.flatMap((b) => (b.offcutId ? [b.offcutId] : []));
  const tags = ids.length
    ? await db.select({ id: offcuts.id, tag: offcuts.tag }).from(offcuts).where(inArray(offcuts.id, ids))
    : [];
  return {
    job: row,
    offcutTags: Object.fromEntries(tags.map((t) => [t.id, t.tag])) as Record<number, string>,
  };
}
export type PlanContext = Awaited<ReturnType<typeof getPlanContext>>;
