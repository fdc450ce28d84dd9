// The release itself, inside a caller's transaction. No `server-only`: the demo seed releases plans too.
import { and, eq, inArray, ne } from 'drizzle-orm';
import type { Tx } from '@/db/client';
import { jobs, offcuts, planBoards, plans } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

export async function releasePlanInTx(tx: Tx, { planId, userId }: { planId: number; userId: number }) {
  const [plan] = await tx.select().from(plans).where(eq(plans.id, planId)).for('update');
  if (!plan) throw notFound('That plan');
  const [job] = await tx.select().from(jobs).where(eq(jobs.id, plan.jobId)).for('update');
  if (plan.status !== 'planned' || !['draft', 'planned'].includes(job.status)) {
    throw new AppError(
      'conflict',
      `This plan is ${plan.status} and job ${job.reference} is ${job.status}: it cannot be released.`,
    );
  }
  const boards = await tx.select().from(planBoards).where(eq(planBoards.planId, planId));
  const offcutIds = boards.flatMap((b) => (b.offcutId ? [b.offcutId] : []));
  if (offcutIds.length) {
    const rows = await tx
      .select()
      .from(offcuts)
      .where(inArray(offcuts.id, offcutIds))
      .orderBy(offcuts.id)
      .for('update');
    const taken = rows.filter((o) => o.status !== 'available');
    if (taken.length) {
      throw new AppError(
        'conflict',
        `Offcut${taken.length > 1 ? 's' : ''} ${taken.map((o) => o.tag).join(', ')} ${taken.length > 1 ? 'are' : 'is'} no longer on the rack. Plan the job again.`,
        { offcuts: taken.map((o) => ({ id: o.id, tag: o.tag, status: o.status })) },
      );
    }
    const now = new Date();
    await tx
      .update(offcuts)
      .set({ status: 'reserved', reservedByPlanId: planId, updatedAt: now })
      .where(inArray(offcuts.id, offcutIds));
    await recordOffcutMovement(
      tx,
      rows.map((o) => ({
        at: now,
        kind: 'offcut_reserved' as const,
        userId,
        sectionId: o.sectionId,
        offcutId: o.id,
        lengthMm: o.lengthMm,
        planId,
        jobId: job.id,
        reason: `Reserved for job ${job.reference}`,
      })),
    );
  }
  await tx.update(plans).set({ status: 'released', releasedAt: new Date() }).where(eq(plans.id, planId));
  // The job's other plans can no longer be released.
  await tx
    .update(plans)
    .set({ status: 'superseded' })
    .where(and(eq(plans.jobId, job.id), ne(plans.id, planId), eq(plans.status, 'planned')));
  await tx.update(jobs).set({ status: 'released', updatedAt: new Date() }).where(eq(jobs.id, job.id));
  return { planId, jobId: job.id, reservedOffcuts: offcutIds.length };
}
