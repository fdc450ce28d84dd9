import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs } from '@/db/schema';
import { AppError } from '@/lib/errors';
import type { CreateJobBody } from '@/lib/validations/jobs';
import { nextJobReference } from './next-job-reference';

/** Creates a draft job; a missing reference becomes the next J-number. */
export async function createJob({ body, userId }: { body: CreateJobBody; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const reference = body.reference ?? (await nextJobReference(tx));
    const [clash] = await tx.select({ id: jobs.id }).from(jobs).where(eq(jobs.reference, reference));
    if (clash) throw new AppError('conflict', `A job with reference ${reference} already exists.`);
    const [job] = await tx
      .insert(jobs)
      .values({
        reference,
        customerName: body.customer,
        customerEmail: body.customerEmail ?? '',
        dueDate: body.dueDate ?? null,
        notes: body.notes ?? '',
        createdBy: userId,
      })
      .returning();
    return job;
  });
}
