// The release rule: cut timber cannot be returned, so a plan goes to the saw only when its quote is
// accepted and paid (deposit or in full) or on account, unless the owner overrides with a reason.
import { eq } from 'drizzle-orm';
import type { DbOrTx } from '@/db';
import { jobs, payments, plans } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { getPlanQuote } from './get-plan-quote';
import { missingForRelease, paidPence, paymentState } from './payment-state';

export async function checkReleaseGate(
  tx: DbOrTx,
  {
    planId,
    override,
    userId,
    isOwner,
  }: { planId: number; override?: string; userId: number; isOwner: boolean },
) {
  const quote = await getPlanQuote(tx, { planId });
  const paid = paidPence(await tx.select().from(payments).where(eq(payments.jobId, quote.jobId)));
  const missing = missingForRelease(paymentState(quote, paid));
  if (!missing) return;
  const [job] = await tx.select().from(jobs).where(eq(jobs.id, quote.jobId));
  if (!override) {
    throw new AppError(
      'conflict',
      `Job ${job.reference} cannot go to the saw yet: ${missing} (quote ${quote.number}). Cut timber cannot be returned. The owner can override with a reason.`,
      { quote: quote.number, missing },
    );
  }
  if (!isOwner) throw new AppError('forbidden', 'Only the owner can send an unpaid job to the saw.');
  await tx
    .update(plans)
    .set({ releaseOverrideReason: override, releaseOverrideBy: userId })
    .where(eq(plans.id, planId));
}
