// The owner refunds what a cancelled job paid, through the payment service's SDK. The service
// confirms each refund by a signed webhook event, which writes a negative ledger row with who and why.
import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { jobs, payments } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';
import { paymentClient } from '@/lib/payments/payment-client';

export async function refundJob({
  jobId,
  userId,
  reason,
}: {
  jobId: number;
  userId: number;
  reason: string;
}) {
  const db = await getDb();
  const [job] = await db.select().from(jobs).where(eq(jobs.id, jobId));
  if (!job) throw notFound('That job');
  if (job.status !== 'cancelled')
    throw new AppError('conflict', `Cancel job ${job.reference} before refunding it.`);
  const ledger = await db.select().from(payments).where(eq(payments.jobId, jobId));
  const byIntent = new Map<string, number>();
  for (const p of ledger.filter((x) => x.status === 'succeeded' && x.paymentIntentId)) {
    byIntent.set(p.paymentIntentId!, (byIntent.get(p.paymentIntentId!) ?? 0) + p.amountPence);
  }
  const due = [...byIntent].filter(([, amount]) => amount > 0);
  if (!due.length) throw new AppError('conflict', `Job ${job.reference} has no card payment left to refund.`);
  let requested = 0;
  for (const [intent, amount] of due) {
    try {
      const refund = await paymentClient().refunds.create({
        payment_intent: intent,
        amount,
        // The webhook writes the ledger row from these, once the service confirms the refund.
        metadata: { jobId: String(jobId), userId: String(userId), reason },
      });
      requested += refund.amount;
    } catch (error) {
      const why = error instanceof Error ? error.message : String(error);
      throw new AppError(
        'unavailable',
        `The payment service refused the refund (${why}). ${requested ? 'Some refunds went through; the ledger shows them once the service confirms.' : 'Nothing was refunded.'}`,
      );
    }
  }
  return { requestedPence: requested };
}
