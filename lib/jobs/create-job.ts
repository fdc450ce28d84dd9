import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs } from '@/db/schema';
import { resolveJobCustomer } from '@/lib/customers/resolve-job-customer';
import { AppError } from '@/lib/errors';
import type { CreateJobBody } from '@/lib/validations/jobs';
import { nextJobReference } from './next-job-reference';

/** Creates a draft job for a customer record; a missing reference becomes the next J-number. */
export async function createJob({ body, userId }: { body: CreateJobBody; userId: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const reference = body.reference ?? (await nextJobReference(tx));
    const [clash] = await tx.select({ id: jobs.id }).from(jobs).where(eq(jobs.reference, reference));
    if (clash) throw new AppError('conflict', `A job with reference ${reference} already exists.`);
    const customer = await resolveJobCustomer(tx, {
      customerId: body.customerId,
      newCustomer: body.newCustomer,
      name: body.customerName,
      email: body.customerEmail,
    });
    const [job] = await tx
      .insert(jobs)
      .values({
        reference,
        customerId: customer.id,
        customerName: customer.name,
        customerEmail: body.customerEmail || customer.email,
        customerPhone: customer.phone,
        deliveryChargePence: body.deliveryChargePence ?? 0,
        dueDate: body.dueDate ?? null,
        notes: body.notes ?? '',
        createdBy: userId,
      })
      .returning();
    return job;
  });
}
