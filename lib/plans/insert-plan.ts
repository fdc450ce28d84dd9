// Stores a composed plan and its board list, and marks the job planned, in one transaction.
// No `server-only` here: the demo seed stores plans the same way.
import { eq } from 'drizzle-orm';
import type { PgliteDatabase } from 'drizzle-orm/pglite';
import * as schema from '@/db/schema';
import type { composePlan } from './compose-plan';
import type { PlanSettings } from './plan-shapes';

type ComposedPlan = Awaited<ReturnType<typeof composePlan>>;

export async function insertPlan(
  db: PgliteDatabase<typeof schema>,
  {
    jobId,
    settings,
    plan,
    userId,
    createdAt,
  }: { jobId: number; settings: PlanSettings; plan: ComposedPlan; userId: number; createdAt?: Date },
): Promise<number> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(schema.plans)
      .values({
        jobId,
        status: 'planned',
        settings,
        sections: plan.sections,
        totals: plan.totals,
        price: plan.price,
        pricePence: plan.pricePence,
        createdBy: userId,
        createdAt,
      })
      .returning({ id: schema.plans.id });
    if (plan.boards.length) {
      await tx.insert(schema.planBoards).values(plan.boards.map((b) => ({ ...b, planId: row.id })));
    }
    await tx
      .update(schema.jobs)
      .set({ status: 'planned', updatedAt: new Date() })
      .where(eq(schema.jobs.id, jobId));
    return row.id;
  });
}
