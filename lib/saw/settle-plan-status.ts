// After a board changes at the saw, the plan and job follow: first board → cutting, last → done.
import { eq } from 'drizzle-orm';
import type { DbOrTx, Tx } from '@/db';
import { jobs, planBoards, plans } from '@/db/schema';

/** How far the saw has got with a plan, and the statuses that follow from it. Reads only. */
export async function planProgress(db: DbOrTx, planId: number) {
  const boards = await db
    .select({ status: planBoards.status })
    .from(planBoards)
    .where(eq(planBoards.planId, planId));
  const pending = boards.filter((b) => b.status === 'pending').length;
  const boardsDone = boards.length - pending;
  return {
    boards: boards.length,
    boardsDone,
    planStatus: pending === 0 ? ('done' as const) : ('released' as const),
    jobStatus:
      pending === 0 ? ('done' as const) : boardsDone > 0 ? ('cutting' as const) : ('released' as const),
  };
}

export async function settlePlanStatus(tx: Tx, { planId, jobId }: { planId: number; jobId: number }) {
  const progress = await planProgress(tx, planId);
  await tx.update(plans).set({ status: progress.planStatus }).where(eq(plans.id, planId));
  await tx.update(jobs).set({ status: progress.jobStatus, updatedAt: new Date() }).where(eq(jobs.id, jobId));
  return progress;
}
