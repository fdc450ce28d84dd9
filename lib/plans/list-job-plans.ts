import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { plans } from '@/db/schema';
import type { PlanSettings, PlanTotals } from './plan-shapes';

/** A job's plans, newest first, with the figures needed to choose between them. */
export async function listJobPlans({ jobId }: { jobId: number }, tx?: DbOrTx) {
  const db = tx ?? (await getDb());
  const rows = await db
    .select({
      id: plans.id,
      status: plans.status,
      settings: plans.settings,
      totals: plans.totals,
      pricePence: plans.pricePence,
      createdAt: plans.createdAt,
      releasedAt: plans.releasedAt,
    })
    .from(plans)
    .where(eq(plans.jobId, jobId))
    .orderBy(desc(plans.id));
  return rows.map((r) => ({ ...r, settings: r.settings as PlanSettings, totals: r.totals as PlanTotals }));
}
export type JobPlanRow = Awaited<ReturnType<typeof listJobPlans>>[number];
