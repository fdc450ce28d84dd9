import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { Tx } from '@/db';
import { jobs, plans } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';

/**
 * Checks a job's cut list may change, inside the caller's transaction. A planned job goes back to
 * draft and its plans are superseded: they were made for the old list.
 */
export async function openJobForItemEdits(tx: Tx, jobId: number) {
  const [job] = await tx.select().from(jobs).where(eq(jobs.id, jobId)).for('update');
  if (!job) throw notFound('That job');
  if (job.status === 'cancelled')
    throw new AppError('conflict', `Job ${job.reference} is cancelled; reopen it to change its cut list.`);
  if (job.status !== 'draft' && job.status !== 'planned') {
    throw new AppError(
      'conflict',
      `Job ${job.reference} is ${job.status}; take its plan back from the saw before changing the cut list.`,
    );
  }
  if (job.status === 'planned') {
    await tx
      .update(plans)
      .set({ status: 'superseded' })
      .where(and(eq(plans.jobId, jobId), eq(plans.status, 'planned')));
    await tx.update(jobs).set({ status: 'draft', updatedAt: new Date() }).where(eq(jobs.id, jobId));
  }
  return job;
}
