import 'server-only';
import { and, eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, offcuts, planBoards, plans } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

/** Takes a plan back from the saw before any board is cut, returning its offcuts to the rack. */
export async function unreleasePlan({ planId, userId }: { planId: number; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [plan] = await tx.select().from(plans).where(eq(plans.id, planId)).for('update');
    if (!plan) throw notFound('That plan');
    if (plan.status !== 'released') throw new AppError('conflict', 'Only a released plan can be taken back.');
    const started = await tx
      .select({ id: planBoards.id })
      .from(planBoards)
      .where(and(eq(planBoards.planId, planId), eq(planBoards.status, 'done')));
    if (started.length) throw new AppError('conflict', 'The saw has already cut boards of this plan.');
    const [job] = await tx.select().from(jobs).where(eq(jobs.id, plan.jobId)).for('update');
    const reserved = await tx
      .update(offcuts)
      .set({ status: 'available', reservedByPlanId: null, updatedAt: new Date() })
      .where(and(eq(offcuts.reservedByPlanId, planId), eq(offcuts.status, 'reserved')))
      .returning();
    if (reserved.length) {
      await recordOffcutMovement(
        tx,
        reserved.map((o) => ({
          kind: 'offcut_unreserved' as const,
          userId,
          sectionId: o.sectionId,
          offcutId: o.id,
          lengthMm: o.lengthMm,
          planId,
          jobId: job.id,
          reason: `Back on the rack: job ${job.reference} taken back from the saw`,
        })),
      );
    }
    await tx.update(plans).set({ status: 'planned', releasedAt: null }).where(eq(plans.id, planId));
    await tx.update(jobs).set({ status: 'planned', updatedAt: new Date() }).where(eq(jobs.id, job.id));
    return { planId, jobId: job.id, returnedOffcuts: reserved.length };
  });
}
