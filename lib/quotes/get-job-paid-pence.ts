import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { payments } from '@/db/schema';
import { paidPence } from './payment-state';

/** What a job's customer has paid so far, less refunds. */
export async function getJobPaidPence({ jobId }: { jobId: number }) {
  const db = await getDb();
  return paidPence(await db.select().from(payments).where(eq(payments.jobId, jobId)));
}
