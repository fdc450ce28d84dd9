// GET /api/plans/[planId] – a plan: per section the solver's input and output, totals, price, boards,
// and its quote (number, validity, lines, net, VAT, gross in whole pence)
import { NextResponse } from 'next/server';
import { getDb } from '@/db';
import { parseId, route } from '@/lib/api/route';
import { getPlanById } from '@/lib/plans/get-plan';
import { getPlanQuote, quoteView } from '@/lib/quotes/get-plan-quote';
import { getJobPaidPence } from '@/lib/quotes/get-job-paid-pence';
import { paymentState } from '@/lib/quotes/payment-state';

export const GET = route<{ planId: string }>('plans:read', async ({ params }) => {
  const planId = parseId(params.planId, 'That plan');
  const plan = await getPlanById({ planId });
  const stored = await getPlanQuote(await getDb(), { planId });
  const paidPence = await getJobPaidPence({ jobId: plan.jobId });
  const quote = { ...quoteView(stored), paidPence, paymentState: paymentState(stored, paidPence) };
  return NextResponse.json({ ...plan, quote });
});
