import 'server-only';
import { and, eq, ne } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, plans, type NewJob } from '@/db/schema';
import { resolveJobCustomer } from '@/lib/customers/resolve-job-customer';
import { AppError, notFound } from '@/lib/errors';
import type { UpdateJobBody } from '@/lib/validations/jobs';

/** Edits a job's details; cancels a draft or planned job, or reopens a cancelled one as a draft. */
export async function updateJob({ jobId, body }: { jobId: number; body: UpdateJobBody }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [job] = await tx.select().from(jobs).where(eq(jobs.id, jobId)).for('update');
    if (!job) throw notFound('That job');
    const changes: Partial<NewJob> = { updatedAt: new Date() };
    if (body.customerId !== undefined || body.newCustomer !== undefined || body.customerName !== undefined) {
      const customer = await resolveJobCustomer(tx, {
        customerId: body.customerId,
        newCustomer: body.newCustomer,
        name: body.customerName,
      });
      Object.assign(changes, {
        customerId: customer.id,
        customerName: customer.name,
        customerPhone: customer.phone,
      });
    }
    if (body.deliveryChargePence !== undefined) changes.deliveryChargePence = body.deliveryChargePence;
    if (body.customerEmail !== undefined) changes.customerEmail = body.customerEmail;
    if (body.dueDate !== undefined) changes.dueDate = body.dueDate;
    if (body.notes !== undefined) changes.notes = body.notes;
    if (body.reference !== undefined && body.reference !== job.reference) {
      const [clash] = await tx
        .select({ id: jobs.id })
        .from(jobs)
        .where(and(eq(jobs.reference, body.reference), ne(jobs.id, jobId)));
      if (clash) throw new AppError('conflict', `A job with reference ${body.reference} already exists.`);
      changes.reference = body.reference;
    }
    if (body.status === 'cancelled' && job.status !== 'cancelled') {
      if (job.status !== 'draft' && job.status !== 'planned') {
        throw new AppError(
          'conflict',
          `Job ${job.reference} is ${job.status}; take its plan back from the saw before cancelling.`,
        );
      }
      changes.status = 'cancelled';
      await tx
        .update(plans)
        .set({ status: 'superseded' })
        .where(and(eq(plans.jobId, jobId), eq(plans.status, 'planned')));
    }
    if (body.status === 'draft' && job.status !== 'draft') {
      if (job.status !== 'cancelled')
        throw new AppError(
          'conflict',
          `Only a cancelled job can be reopened; job ${job.reference} is ${job.status}.`,
        );
      changes.status = 'draft';
    }
    const [updated] = await tx.update(jobs).set(changes).where(eq(jobs.id, jobId)).returning();
    return updated;
  });
}
