// Plan runs as stored in the database: the one record of a queued planning request that every app
// instance and worker reads, so status and progress are shared, not held in one process's memory.
import 'server-only';
import { and, eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { planRuns, type PlanRun } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';

export function planRunView(run: PlanRun) {
  return {
    runId: run.id,
    jobId: run.jobId,
    status: run.status,
    sectionsTotal: run.sectionsTotal,
    sectionsDone: run.sectionsDone,
    attempts: run.attempts,
    planId: run.planId,
    error: run.error,
    createdAt: run.createdAt,
    updatedAt: run.updatedAt,
  };
}
export type PlanRunView = ReturnType<typeof planRunView>;

export async function getPlanRun(db: DbOrTx, runId: number): Promise<PlanRun> {
  const [run] = await db.select().from(planRuns).where(eq(planRuns.id, runId));
  if (!run) throw notFound('That planning run');
  return run;
}

/** Calls a run off. A worker that is solving it finishes its search but stores nothing. */
export async function cancelPlanRun(db: DbOrTx, runId: number): Promise<PlanRun> {
  const [run] = await db
    .update(planRuns)
    .set({ status: 'cancelled', updatedAt: new Date() })
    .where(and(eq(planRuns.id, runId), inArray(planRuns.status, ['queued', 'running'])))
    .returning();
  if (run) return run;
  const current = await getPlanRun(db, runId);
  throw new AppError('conflict', `This planning run is already ${current.status}; it cannot be cancelled.`);
}

/** A run that will not be tried again: keeps a done or cancelled run as it is. */
export async function failPlanRun(db: DbOrTx, runId: number, message: string): Promise<void> {
  await db
    .update(planRuns)
    .set({ status: 'failed', error: message, updatedAt: new Date() })
    .where(and(eq(planRuns.id, runId), inArray(planRuns.status, ['queued', 'running'])));
}

export async function countSolvedSection(db: DbOrTx, runId: number): Promise<void> {
  await db
    .update(planRuns)
    .set({ sectionsDone: sql`${planRuns.sectionsDone} + 1`, updatedAt: new Date() })
    .where(eq(planRuns.id, runId));
}
