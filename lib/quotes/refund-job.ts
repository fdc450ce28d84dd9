// The owner refunds what a cancelled job paid, through the payment service's SDK; each refund is a
// negative row in the ledger with who and why.
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
  let refunded = 0;
  for (const [intent, amount] of due) {
    let refund;
    try {
      refund = await paymentClient().refunds.create({ payment_intent: intent, amount });
    } catch (error) {
      const why = error instanceof Error ? error.message : String(error);
      throw new AppError(
        'unavailable',
        `The payment service refused the refund (${why}). ${refunded ? 'Some refunds went through and are recorded.' : 'Nothing was refunded.'}`,
      );
    }
    await db.insert(payments).values({
      jobId,
      quoteId: null,
      kind: 'refund',
      status: 'succeeded',
      amountPence: -refund.amount,
      userId,
      paymentIntentId: intent,
      note: reason,
    });
    refunded += refund.amount;
  }
  return { refundedPence: refunded };
}
