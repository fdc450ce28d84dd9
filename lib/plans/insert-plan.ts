// Stores a composed plan and its board list, and marks the job planned, in one transaction.
// No `server-only` here: the demo seed stores plans the same way.
import { eq } from 'drizzle-orm';
import * as schema from '@/db/schema';
import type { Db, Tx } from '@/db/types';
import { AppError } from '@/lib/errors';
import type { composePlan } from './compose-plan';
import type { PlanSettings } from './plan-shapes';

type ComposedPlan = Awaited<ReturnType<typeof composePlan>>;
export type PlanToStore = {
  jobId: number;
  settings: PlanSettings;
  plan: ComposedPlan;
  userId: number;
  createdAt?: Date;
};

/**
 * The insert inside a caller's transaction. Solving takes seconds, and someone may release another
 * plan or cancel the job meanwhile, so the job's status is checked again here, under a row lock.
 */
export async function insertPlanInTx(tx: Tx, { jobId, settings, plan, userId, createdAt }: PlanToStore) {
  const [job] = await tx.select().from(schema.jobs).where(eq(schema.jobs.id, jobId)).for('update');
  if (!job) throw new AppError('not_found', 'That job was not found.');
  if (job.status !== 'draft' && job.status !== 'planned') {
    throw new AppError(
      'conflict',
      `Job ${job.reference} became ${job.status} while it was being planned; the plan was not stored.`,
    );
  }
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
}

export async function insertPlan(db: Db, toStore: PlanToStore): Promise<number> {
  return db.transaction((tx) => insertPlanInTx(tx, toStore));
}
