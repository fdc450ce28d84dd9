import 'server-only';
import { getDb } from '@/db';
import { getJobPaidPence } from '@/lib/quotes/get-job-paid-pence';
import { getPlanQuote, quoteView } from '@/lib/quotes/get-plan-quote';
import { paymentState } from '@/lib/quotes/payment-state';
import { getPlanById } from './get-plan';

/** A plan as the office's plan page reads it: the plan, and its quote with what the job has paid. */
export async function getPlanWithQuote({ planId }: { planId: number }) {
  const plan = await getPlanById({ planId });
  const stored = await getPlanQuote(await getDb(), { planId });
  const paidPence = await getJobPaidPence({ jobId: plan.jobId });
  const quote = { ...quoteView(stored), paidPence, paymentState: paymentState(stored, paidPence) };
  return { ...plan, quote };
}
