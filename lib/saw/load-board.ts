// Loads a plan, its job and one of its boards inside a transaction, for the saw's changes.
import { and, eq } from 'drizzle-orm';
import type { Tx } from '@/db';
import { jobs, planBoards, plans } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';

export async function loadPlanForSaw(tx: Tx, planId: number) {
  const [plan] = await tx.select().from(plans).where(eq(plans.id, planId)).for('update');
  if (!plan) throw notFound('That plan');
  const [job] = await tx.select().from(jobs).where(eq(jobs.id, plan.jobId)).for('update');
  return { plan, job };
}

export async function loadBoardForSaw(tx: Tx, { planId, boardNo }: { planId: number; boardNo: number }) {
  const { plan, job } = await loadPlanForSaw(tx, planId);
  const [board] = await tx
    .select()
    .from(planBoards)
    .where(and(eq(planBoards.planId, planId), eq(planBoards.boardNo, boardNo)));
  if (!board) throw notFound(`Board ${boardNo} of this plan`);
  return { plan, job, board };
}

/** Only a plan at the saw (released, or done for a repeated confirmation) can have boards cut. */
export function assertAtSaw(plan: { status: string }, job: { reference: string; status: string }) {
  if (plan.status !== 'released') {
    throw new AppError(
      'conflict',
      `This plan is ${plan.status}, not at the saw. Job ${job.reference} is ${job.status}.`,
    );
  }
}
