import 'server-only';
import { asc } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs } from '@/db/schema';

/** Jobs soonest due first, for the office's job list. */
export async function listJobsBrief() {
  const db = await getDb();
  return db
    .select({
      id: jobs.id,
      reference: jobs.reference,
      customerName: jobs.customerName,
      dueDate: jobs.dueDate,
      status: jobs.status,
    })
    .from(jobs)
    .orderBy(asc(jobs.dueDate));
}
