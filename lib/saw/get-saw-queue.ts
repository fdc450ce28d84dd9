import 'server-only';
import { asc, eq, inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, planBoards, plans } from '@/db/schema';
import type { PlanSection } from '@/lib/plans/plan-shapes';

/** Released plans, soonest due first, with how far the saw has got through each. */
export async function getSawQueue() {
  const db = await getDb();
  const rows = await db
    .select({
      planId: plans.id,
      sections: plans.sections,
      releasedAt: plans.releasedAt,
      jobId: jobs.id,
      reference: jobs.reference,
      customerName: jobs.customerName,
      dueDate: jobs.dueDate,
      jobStatus: jobs.status,
      officeFlag: jobs.officeFlag,
    })
    .from(plans)
    .innerJoin(jobs, eq(jobs.id, plans.jobId))
    .where(eq(plans.status, 'released'))
    .orderBy(sql`${jobs.dueDate} asc nulls last`, asc(plans.releasedAt));
  const counts = rows.length
    ? await db
        .select({
          planId: planBoards.planId,
          boards: sql<number>`count(*)::int`,
          done: sql<number>`count(*) filter (where ${planBoards.status} <> 'pending')::int`,
        })
        .from(planBoards)
        .where(
          inArray(
            planBoards.planId,
            rows.map((r) => r.planId),
          ),
        )
        .groupBy(planBoards.planId)
    : [];
  return rows.map(({ sections, ...r }) => {
    const c = counts.find((x) => x.planId === r.planId);
    return {
      ...r,
      sections: (sections as PlanSection[]).map((s) => s.sectionName),
      boards: c?.boards ?? 0,
      boardsDone: c?.done ?? 0,
    };
  });
}
export type SawQueueEntry = Awaited<ReturnType<typeof getSawQueue>>[number];
